import "server-only";
import { AuthError, can, forbidden, requireSchematicAccess } from "@/lib/auth/authorize";
import { getProjectHead } from "@/db/queries/project-admin";
import { getSchematic } from "@/db/queries/schematics";
import { newestIssuedRevision } from "@/db/queries/site-events";
import { revisionWithResults } from "@/lib/revisions/with-results";
import type { Schematic } from "@/lib/schematic";
import type { CommissioningDesign } from "./commissioning";
import { TOLERANCES } from "./commissioning";
import { commissioningDesign } from "./design-values";
import { partName } from "./names";
import { PRESSURE_TEST_CAUTION } from "./pressure-test";
import { siteRecordsOfSchematic, tickStates, type SiteRecords } from "./records";
import { siteRulesOf, type SiteRules } from "./rules";
import { groupsOf, rowsOf } from "./sheet";
import type { SiteGroup, SiteRow, TickState } from "./types";

/** GET /api/v1/schematics/{id}/site: everything the phone needs to work offline on the issued revision. */
export interface SiteSheet {
  project: { id: string; name: string; site: string };
  schematic: { id: string; name: string };
  revision: { id: string; number: number; issuedAt: string; engineVersion: string | null };
  document: Schematic;
  groups: SiteGroup[];
  rows: Record<string, SiteRow>;
  ticks: Record<string, TickState>;
  records: SiteRecords;
  rules: SiteRules;
  design: CommissioningDesign;
  tolerances: typeof TOLERANCES;
  /** parts a pressure test must keep away from (isolateBeforeTest) */
  testParts: { id: string; type: string; label: string; setBar?: number }[];
  cautions: { pressureTest: string; general: string };
  me: { id: string; name: string; role: string; mayRecord: boolean };
  asOf: string;
}

export const GENERAL_CAUTION =
  "Design aid: to be checked by a competent person. Isolate and make safe before work; follow local codes, manufacturers' instructions and licensed practice.";

export async function siteSheet(schematicId: string): Promise<SiteSheet> {
  const access = await requireSchematicAccess(schematicId, "read");
  if (!can(access.role, "site.read")) throw forbidden("site.read", access.role);
  const issued = await newestIssuedRevision(schematicId);
  if (!issued) throw new AuthError(404, "This schematic has no issued revision yet: the site sheet opens once a revision is issued.");
  const [r, schematic, project, ticks, records, rules] = await Promise.all([
    revisionWithResults(issued.id), getSchematic(schematicId), getProjectHead(access.schematic.projectId),
    tickStates(schematicId), siteRecordsOfSchematic(schematicId), siteRulesOf(access.schematic.projectId),
  ]);
  if (!r || !schematic || !project) throw new AuthError(404, "The issued revision could not be read.");
  const doc = r.document;
  const rows = rowsOf(doc, r.results);
  const testParts = doc.parts.filter((p) => ["safety-valve", "expansion-vessel", "heat-pump", "boiler", "cylinder", "pressure-gauge"].includes(p.type))
    .map((p) => ({ id: p.id, type: p.type, label: partName(p), ...(p.type === "safety-valve" ? { setBar: (p.props as { setBar: number }).setBar } : {}) }));
  return {
    project: { id: project.id, name: project.name, site: project.site },
    schematic: { id: schematicId, name: schematic.name },
    revision: { id: issued.id, number: issued.number, issuedAt: r.revision.statusChangedAt, engineVersion: r.engineVersion },
    document: doc,
    groups: groupsOf(doc, r.results),
    rows,
    ticks: Object.fromEntries(Object.entries(ticks).filter(([id]) => id in rows)),
    records, rules,
    design: commissioningDesign(doc, r.results),
    tolerances: TOLERANCES,
    testParts,
    cautions: { pressureTest: PRESSURE_TEST_CAUTION, general: GENERAL_CAUTION },
    me: { id: access.user.id, name: access.user.name, role: access.role, mayRecord: can(access.role, "site.record") },
    asOf: new Date().toISOString(),
  };
}
