// The rooms page's calls to the one API (app/api/v1/projects/[id]/…). Each answers the
// parsed body, or throws an ApiError carrying the server's message and issues.
import type { CsvIssue, Mapping } from "@/lib/rooms/csv-table";
import type { FlowCheck } from "@/lib/rooms/flow-temperature";
import type { ImportRow } from "@/lib/rooms/rooms-csv";
import type { EmitterEntry, Room } from "@/lib/rooms/schema";
import type { Finding } from "@/lib/schematic";

export class ApiError extends Error {
  constructor(message: string, readonly status: number, readonly body: Record<string, unknown>) {
    super(message);
  }
}

async function call<T>(url: string, init?: RequestInit): Promise<T> {
  const res = await fetch(url, init);
  const body = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) throw new ApiError(typeof body.error === "string" ? body.error : `${res.status} ${res.statusText}`, res.status, body);
  return body as T;
}

const base = (projectId: string) => `/api/v1/projects/${projectId}`;
const json = (method: string, value: unknown): RequestInit => ({ method, headers: { "content-type": "application/json" }, body: JSON.stringify(value) });
const csv = (method: string, text: string): RequestInit => ({ method, headers: { "content-type": "text/csv" }, body: text });

export interface RoomsState { rooms: Room[]; lockVersion: number; updatedAt: string | null }
export interface ImportPreview { headers: string[]; mapping: Mapping; rows: ImportRow[]; issues: CsvIssue[]; saved: boolean; lockVersion?: number }
export interface DraftAnswer { schematicId: string; projectId: string; name: string; findings: Finding[]; engineFindings: Finding[] }

export const roomsApi = {
  get: (projectId: string) => call<RoomsState>(`${base(projectId)}/rooms`),
  put: (projectId: string, rooms: unknown[], lockVersion: number) => call<RoomsState>(`${base(projectId)}/rooms`, json("PUT", { rooms, lockVersion })),
  importCsv: (projectId: string, text: string, o: { save: boolean; mapping?: Mapping }) => {
    const q = new URLSearchParams();
    if (o.save) q.set("save", "true");
    if (o.mapping) q.set("mapping", JSON.stringify(o.mapping));
    return call<ImportPreview>(`${base(projectId)}/rooms/import?${q}`, csv("POST", text));
  },
  flowCheck: (projectId: string, flowC: number, deltaK: number) =>
    call<FlowCheck>(`${base(projectId)}/rooms/flow-temperature?${new URLSearchParams({ flowC: String(flowC), deltaK: String(deltaK) })}`),
  draft: (projectId: string, plant: unknown) => call<DraftAnswer>(`${base(projectId)}/drafts`, json("POST", { plant })),
  putEmitters: (projectId: string, text: string) => call<{ emitters: EmitterEntry[] }>(`${base(projectId)}/emitter-list`, csv("PUT", text)),
  csvUrl: (projectId: string, what: "rooms" | "emitter-list") => `${base(projectId)}/${what}?format=csv`,
};
