// The pieces a handover report is made of, shared by the model and the sections it gathers.

export type Block =
  | { kind: "para"; text: string; tone?: "warn" | "muted" }
  | { kind: "table"; columns: string[]; rows: string[][]; numeric?: boolean[] }
  | { kind: "drawing" }
  | { kind: "pump-curve"; id: string; label: string; mode: string; curve: [number, number][]; duty: { flowM3h: number; headKpa: number } | null };

export interface Section { id: string; title: string; blocks: Block[] }
