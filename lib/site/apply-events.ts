import "server-only";
import { AuthError, can, forbidden, requireSchematicAccess, type SchematicAccess } from "@/lib/auth/authorize";
import { UserError, zodIssues } from "@/lib/auth/errors";
import { eventOwner, insertEventOnce, newestIssuedRevision } from "@/db/queries/site-events";
import { revisionWithResults } from "@/lib/revisions/with-results";
import type { Schematic } from "@/lib/schematic";
import { eventBatchSchema, MAX_EVENTS_PER_BATCH, siteEventSchema, type EventResult, type SiteEvent } from "./events";
import { siteRulesOf } from "./rules";

// POST /api/v1/schematics/{id}/site/events: a batch of events made on a phone, applied in
// the order sent (the order they were made), each on its own: one that fails is answered
// with its error and the rest still apply. An event is stored once, under the id the phone
// gave it; sent again, it answers "duplicate" and changes nothing.

/** Refused before any event is looked at: nothing of the batch is saved. */
export function checkBatchSize(count: number): void {
  if (count > MAX_EVENTS_PER_BATCH)
    throw new UserError(413, `A batch holds at most ${MAX_EVENTS_PER_BATCH} events; this one has ${count}. Nothing was saved: send them in batches of ${MAX_EVENTS_PER_BATCH} or fewer.`);
}

const FUTURE_SLACK_MS = 24 * 3_600_000; // a phone's clock may be off; a day ahead is not a real time

function targetProblem(e: SiteEvent, doc: Schematic, revisionNumber: number): { path: string; message: string } | null {
  const ids = new Set([...doc.parts.map((p) => p.id), ...doc.pipes.map((p) => p.id)]);
  if (e.target && !ids.has(e.target)) return { path: "target", message: `no pipe or part "${e.target}" on revision ${revisionNumber}` };
  if (e.kind !== "commissioning") return null;
  const types = new Map(doc.parts.map((p) => [p.id, p.type]));
  for (const [i, r] of e.data.readings.entries()) {
    const t = "target" in r ? r.target : undefined;
    if (t === undefined) continue;
    const type = types.get(t);
    const want = r.kind === "pump-head" ? ["pump", "heat-pump", "boiler"] : r.kind === "bypass-opening" ? ["dp-bypass-valve"]
      : r.kind === "vessel-precharge" ? ["expansion-vessel"] : ["safety-valve"];
    if (!type || !want.includes(type)) return { path: `data.readings.${i}.target`, message: `"${t}" is not a ${want.join(" or ")} on revision ${revisionNumber}` };
  }
  return null;
}

const refuse = (id: string | null, path: string, message: string): EventResult =>
  ({ id, status: "error", error: `${path}: ${message}`, issues: [{ path, message }] });

/** Installers and owners record site work (on a schematic they can read). */
export async function requireSiteRecorder(schematicId: string): Promise<SchematicAccess> {
  const access = await requireSchematicAccess(schematicId, "read");
  if (!can(access.role, "site.record")) throw forbidden("site.record", access.role);
  return access;
}

export async function applySiteEvents(access: SchematicAccess, body: unknown): Promise<{ results: EventResult[] }> {
  const schematicId = access.schematic.id;
  const { events } = eventBatchSchema.parse(body);
  checkBatchSize(events.length);
  const issued = await newestIssuedRevision(schematicId);
  if (!issued) throw new UserError(409, "This schematic has no issued revision yet: site work is recorded against an issued revision.");
  const revision = await revisionWithResults(issued.id);
  if (!revision) throw new AuthError(404, "The issued revision could not be read.");
  const rules = await siteRulesOf(access.schematic.projectId);

  const results: EventResult[] = [];
  for (const raw of events) {
    const rawId = typeof (raw as { id?: unknown })?.id === "string" ? (raw as { id: string }).id : null;
    const parsed = siteEventSchema.safeParse(raw);
    if (!parsed.success) {
      const issues = zodIssues(parsed.error);
      results.push({ id: rawId, status: "error", error: `${issues[0]!.path}: ${issues[0]!.message}`, issues });
      continue;
    }
    const e = parsed.data;
    if (Date.parse(e.madeAt) > Date.now() + FUTURE_SLACK_MS) { results.push(refuse(e.id, "madeAt", "is more than a day ahead: check the phone's clock")); continue; }
    const problem = targetProblem(e, revision.document, issued.number);
    if (problem) { results.push(refuse(e.id, problem.path, problem.message)); continue; }
    const corrects = (e.data as { corrects?: string }).corrects;
    if (corrects) {
      const earlier = await eventOwner(corrects);
      if (!earlier || earlier.schematicId !== schematicId || earlier.kind !== e.kind) { results.push(refuse(e.id, "data.corrects", `no ${e.kind} record ${corrects} on this schematic to correct`)); continue; }
    }
    try {
      const stored = await insertEventOnce({
        id: e.id, projectId: access.schematic.projectId, schematicId, revisionId: issued.id, kind: e.kind, target: e.target ?? null,
        data: e.data, context: e.kind === "pressure-test" ? { rule: rules.pressureTest } : {}, madeAt: e.madeAt, authorId: access.user.id,
      });
      if (stored) { results.push({ id: e.id, status: "applied" }); continue; }
      const owner = await eventOwner(e.id);
      results.push(owner && owner.schematicId === schematicId && owner.authorId === access.user.id
        ? { id: e.id, status: "duplicate" }
        : refuse(e.id, "id", "is already the id of another record: make a new one"));
    } catch (err) {
      console.error("[loopwright] site event not stored", e.id, err);
      results.push({ id: e.id, status: "error", error: "This event could not be stored; send it again." });
    }
  }
  return { results };
}
