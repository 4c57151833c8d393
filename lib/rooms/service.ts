import "server-only";
import { z } from "zod";
import { audit } from "@/lib/audit";
import { requireProjectRole } from "@/lib/auth/authorize";
import { requestIp } from "@/lib/auth/request-context";
import { firmOfProject, getFirmEmitters, getRooms, saveFirmEmitters, saveRooms } from "@/db/queries/rooms";
import { formatPath } from "@/lib/schematic";
import { readBodyBytes } from "@/lib/persistence/json-body";
import { importEmitterCsv } from "./emitter-list-csv";
import { flowTemperatureCheck } from "./flow-temperature";
import { importRoomsCsv } from "./rooms-csv";
import { roomCsvFields } from "./rooms-csv";
import { roomsDocSchema } from "./schema";

// Rooms, their CSV import, the flow-temperature check and the firm's emitter list:
// the role check, validation and one call into db/queries each. Every answer is
// {status, body} for the route to send; refusals carry {error, issues}.
// Who: every project member reads; owners and designers change (policy "rooms.edit").

export type Answer = { status: number; body: Record<string, unknown> };
const ok = (body: Record<string, unknown>, status = 200): Answer => ({ status, body });
const refuse = (status: number, error: string, extra: Record<string, unknown> = {}): Answer => ({ status, body: { error, ...extra } });

export async function readRooms(projectId: string): Promise<Answer> {
  await requireProjectRole(projectId, "project.read");
  return ok({ ...(await getRooms(projectId)) });
}

const putEnvelope = z.object({ rooms: z.unknown(), lockVersion: z.number().int().min(0).optional() });

export async function replaceRooms(projectId: string, value: unknown): Promise<Answer> {
  const { user } = await requireProjectRole(projectId, "rooms.edit");
  const env = putEnvelope.safeParse(value);
  if (!env.success) return refuse(400, "The body must be {rooms: [...], lockVersion?}.", { issues: [{ path: "rooms", message: "rooms: expected a list of rooms" }] });
  const doc = roomsDocSchema.safeParse({ rooms: env.data.rooms });
  if (!doc.success) {
    const issues = doc.error.issues.map((i) => {
      const path = formatPath(i.path);
      return { path, message: `${path}: ${i.message}` };
    });
    return refuse(400, `The rooms are not valid: ${issues.slice(0, 3).map((i) => i.message).join("; ")}${issues.length > 3 ? ` (and ${issues.length - 3} more)` : ""}. Nothing was saved.`, { issues });
  }
  const r = await saveRooms({ projectId, rooms: doc.data.rooms, userId: user.id, lockVersion: env.data.lockVersion });
  if (!r.ok) return refuse(409, "Someone else saved the rooms since you opened them; reload to see theirs.", { currentLockVersion: r.currentLockVersion });
  await audit({ actorId: user.id, action: "rooms.saved", projectId, detail: { rooms: doc.data.rooms.length }, ip: await requestIp() });
  return ok({ rooms: doc.data.rooms, lockVersion: r.lockVersion, updatedAt: r.updatedAt });
}

/** Text of an uploaded file: UTF-8, or Windows-1252 when it is not valid UTF-8 (older spreadsheet exports). */
export function decodeText(bytes: Uint8Array): string {
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return new TextDecoder("windows-1252").decode(bytes);
  }
}

const mappingSchema = z.record(z.string(), z.string().nullable()).superRefine((m, ctx) => {
  for (const key of Object.keys(m)) {
    if (!roomCsvFields.some((f) => f.key === key)) ctx.addIssue({ code: "custom", path: [key], message: `unknown field; fields are ${roomCsvFields.map((f) => f.key).join(", ")}` });
  }
});

/** Preview (nothing saved) or, with save, replace the project's rooms — only when no row has a problem. */
export async function importRooms(projectId: string, req: Request): Promise<Answer> {
  const { user } = await requireProjectRole(projectId, "rooms.edit");
  const params = new URL(req.url).searchParams;
  const query = { save: ["true", "1", "yes"].includes(params.get("save") ?? ""), mapping: params.get("mapping") };
  const body = await readCsvBody(req);
  if (!body.ok) return body.answer;
  const text = body.text;
  let mapping: Record<string, string | null> | undefined;
  if (query.mapping) {
    let raw: unknown;
    try {
      raw = JSON.parse(query.mapping);
    } catch {
      return refuse(400, "mapping: not valid JSON; send {\"heatLossW\": \"Loss (W)\", …}.", { issues: [{ line: 0, column: "mapping", message: "not valid JSON" }] });
    }
    const m = mappingSchema.safeParse(raw);
    if (!m.success) {
      const issues = m.error.issues.map((i) => ({ line: 0, column: `mapping.${i.path.join(".")}`, message: i.message }));
      return refuse(400, `mapping.${m.error.issues[0]!.path.join(".")}: ${m.error.issues[0]!.message}`, { issues });
    }
    mapping = m.data;
  }
  const result = importRoomsCsv(text, mapping);
  const preview = { headers: result.headers, mapping: result.mapping, rows: result.rows, issues: result.issues, saved: false };
  if (!query.save) return ok(preview);
  if (result.issues.length) {
    return refuse(400, `${result.issues.length} ${result.issues.length === 1 ? "problem" : "problems"} in the file (first: line ${result.issues[0]!.line}, ${result.issues[0]!.column || "row"}: ${result.issues[0]!.message}); nothing was saved.`, preview);
  }
  const rooms = result.rows.map((r) => r.room!);
  const saved = await saveRooms({ projectId, rooms, userId: user.id });
  if (!saved.ok) return refuse(409, "The rooms changed while importing; try again.");
  await audit({ actorId: user.id, action: "rooms.imported", projectId, detail: { rooms: rooms.length }, ip: await requestIp() });
  return ok({ ...preview, saved: true, lockVersion: saved.lockVersion });
}

const flowQuery = z.object({
  flowC: z.coerce.number({ error: "must be a number" }).min(25, "must be between 25 and 90 °C").max(90, "must be between 25 and 90 °C"),
  deltaK: z.coerce.number({ error: "must be a number" }).min(1, "must be between 1 and 30 K").max(30, "must be between 1 and 30 K"),
});

export async function checkFlowTemperature(projectId: string, query: { flowC: string | null; deltaK: string | null }): Promise<Answer> {
  await requireProjectRole(projectId, "project.read");
  const q = flowQuery.safeParse({ flowC: query.flowC ?? undefined, deltaK: query.deltaK ?? undefined });
  if (!q.success) {
    const issues = q.error.issues.map((i) => ({ path: String(i.path[0]), message: `${String(i.path[0])}: ${i.code === "invalid_type" ? "is missing (a number)" : i.message}` }));
    return refuse(400, issues.map((i) => i.message).join("; "), { issues });
  }
  const [{ rooms }, list] = await Promise.all([getRooms(projectId), firmList(projectId)]);
  return ok({ ...flowTemperatureCheck(rooms, { flowC: q.data.flowC, deltaTK: q.data.deltaK }, list) });
}

export async function firmList(projectId: string) {
  const firm = await firmOfProject(projectId);
  return firm ? (await getFirmEmitters(firm)).emitters : [];
}

export async function readEmitterList(projectId: string): Promise<Answer> {
  await requireProjectRole(projectId, "project.read");
  const firm = await firmOfProject(projectId);
  return ok(firm ? { ...(await getFirmEmitters(firm)) } : { emitters: [], updatedAt: null });
}

/** Replace the firm's emitter list from CSV; every problem refuses the whole file. */
export async function replaceEmitterList(projectId: string, req: Request): Promise<Answer> {
  const { user } = await requireProjectRole(projectId, "rooms.edit");
  const firm = await firmOfProject(projectId);
  if (!firm) return refuse(404, "Project not found, or you are not a member of it.");
  const body = await readCsvBody(req);
  if (!body.ok) return body.answer;
  const { emitters, issues } = importEmitterCsv(body.text);
  if (issues.length) return refuse(400, `${issues.length} ${issues.length === 1 ? "problem" : "problems"} in the list (first: line ${issues[0]!.line}, ${issues[0]!.column || "row"}: ${issues[0]!.message}); nothing was saved.`, { issues });
  await saveFirmEmitters(firm, emitters, user.id);
  await audit({ actorId: user.id, action: "emitters.replaced", projectId, detail: { emitters: emitters.length }, ip: await requestIp() });
  return ok({ emitters });
}

/**
 * The body types a CSV route declares to apiHandler (which answers 415 for any other). Not
 * text/plain: a cross-site HTML form can send that one.
 */
export const CSV_TYPES = ["text/csv", "application/csv", "application/vnd.ms-excel"];

/** A CSV request body as text: 413 above the shared body limit (lib/persistence/json-body.ts readBodyBytes). */
export async function readCsvBody(req: Request): Promise<{ ok: true; text: string } | { ok: false; answer: Answer }> {
  const body = await readBodyBytes(req);
  if (!body.ok) return { ok: false, answer: refuse(body.status, body.error) };
  return { ok: true, text: decodeText(body.bytes) };
}

/** An answer as a Response (JSON). */
export const respond = (a: Answer) => Response.json(a.body, { status: a.status });

/** The answer as JSON, or — for ?format=csv on a successful read — as a CSV download. */
export function respondOrCsv(req: Request, a: Answer, toCsv: (body: Answer["body"]) => string, filename: string): Response {
  if (new URL(req.url).searchParams.get("format") !== "csv" || a.status !== 200) return respond(a);
  return new Response(toCsv(a.body), { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${filename}"` } });
}
