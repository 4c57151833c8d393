import "server-only";
import { listEvents, type StoredEvent } from "@/db/queries/site-events";
import { revisionWithResults } from "@/lib/revisions/with-results";
import { checkFill, checkReading, type CommissioningDesign, type ReadingCheck } from "./commissioning";
import { commissioningDesign } from "./design-values";
import type { CommissioningData, FillData, PressureTestData } from "./events";
import { DEFAULT_PRESSURE_TEST_RULE, evaluatePressureTest, pressureTestRuleSchema, type PressureTestVerdict } from "./pressure-test";
import type { TickState } from "./types";

// The site records of a schematic or of one issued revision, each with its author, when it
// was made, and its check against the design (or the firm's rule, as it stood when the record
// was applied). Records are never changed: a correction is a later record naming the one it
// corrects, and the earlier one is marked `correctedBy`. The handover report reads
// `siteRecordsOfRevision`.

interface RecordBase {
  id: string;
  madeAt: string;
  receivedAt: string;
  author: { id: string | null; name: string | null };
  revisionId: string;
  revisionNumber: number;
  corrects: string | null;
  correctedBy: string | null;
}
export type PressureTestRecord = RecordBase & { kind: "pressure-test"; data: PressureTestData; verdict: PressureTestVerdict };
export type FillRecord = RecordBase & { kind: "fill"; data: FillData; checks: ReadingCheck[] };
export type CommissioningRecord = RecordBase & { kind: "commissioning"; data: CommissioningData; checks: ReadingCheck[] };
export type NoteRecord = RecordBase & { kind: "note"; target: string | null; data: { text: string } };

export interface SiteRecords {
  pressureTests: PressureTestRecord[];
  fills: FillRecord[];
  commissioning: CommissioningRecord[];
  notes: NoteRecord[];
}

const RECORD_KINDS = ["pressure-test", "fill", "commissioning", "note"];

function base(e: StoredEvent, correctedBy: Map<string, string>): RecordBase {
  const corrects = typeof e.data.corrects === "string" ? e.data.corrects : null;
  return { id: e.id, madeAt: e.madeAt, receivedAt: e.receivedAt, author: { id: e.authorId, name: e.authorName },
    revisionId: e.revisionId, revisionNumber: e.revisionNumber, corrects, correctedBy: correctedBy.get(e.id) ?? null };
}

async function build(events: StoredEvent[]): Promise<SiteRecords> {
  const designs = new Map<string, CommissioningDesign | null>();
  const designOf = async (revisionId: string) => {
    if (!designs.has(revisionId)) {
      const r = await revisionWithResults(revisionId);
      designs.set(revisionId, r ? commissioningDesign(r.document, r.results) : null);
    }
    return designs.get(revisionId) ?? null;
  };
  const correctedBy = new Map<string, string>();
  for (const e of events) if (typeof e.data.corrects === "string") correctedBy.set(e.data.corrects, e.id);
  const out: SiteRecords = { pressureTests: [], fills: [], commissioning: [], notes: [] };
  for (const e of events) {
    const b = base(e, correctedBy);
    if (e.kind === "pressure-test") {
      const rule = pressureTestRuleSchema.safeParse(e.context.rule);
      const data = e.data as unknown as PressureTestData;
      out.pressureTests.push({ ...b, kind: "pressure-test", data, verdict: evaluatePressureTest(data, rule.success ? rule.data : DEFAULT_PRESSURE_TEST_RULE) });
    } else if (e.kind === "fill" || e.kind === "commissioning") {
      const design = await designOf(e.revisionId);
      if (e.kind === "fill") {
        const data = e.data as unknown as FillData;
        out.fills.push({ ...b, kind: "fill", data, checks: design ? checkFill(data, design) : [] });
      } else {
        const data = e.data as unknown as CommissioningData;
        out.commissioning.push({ ...b, kind: "commissioning", data, checks: design ? data.readings.map((r) => checkReading(r, design)) : [] });
      }
    } else if (e.kind === "note") {
      out.notes.push({ ...b, kind: "note", target: e.target, data: e.data as { text: string } });
    }
  }
  return out;
}

/** The records made against one revision (the handover report of that revision reads these). */
export async function siteRecordsOfRevision(revisionId: string): Promise<SiteRecords> {
  return build(await listEvents({ revisionId }, RECORD_KINDS));
}

/** Every record of a schematic, whichever issued revision each was made against. */
export async function siteRecordsOfSchematic(schematicId: string): Promise<SiteRecords> {
  return build(await listEvents({ schematicId }, RECORD_KINDS));
}

/** Installed or not, per pipe or part: the latest tick or untick by the time it was made wins. */
export async function tickStates(schematicId: string): Promise<Record<string, TickState>> {
  const out: Record<string, TickState> = {};
  for (const e of await listEvents({ schematicId }, ["tick", "untick"])) {
    if (e.target) out[e.target] = { ticked: e.kind === "tick", by: e.authorName, at: e.madeAt, eventId: e.id };
  }
  return out;
}
