/**
 * Valve models a part may name (`props.valveModel`) so the site sheet can give a
 * balancing preset in turns as well as Kv. Each model has a turns table: Kv
 * (m³/h at 1 bar) at each number of turns open from closed, rising with turns.
 *
 * INVENTED DEMO TABLES: these are not any maker's data; they only show how a
 * table is read. A real valve's table comes from its maker's sheet.
 */

export interface ValveModel {
  id: string;
  name: string;
  /** [turns open, Kv] pairs, turns ascending, Kv rising. */
  table: readonly (readonly [number, number])[];
}

export const valveModels = [
  {
    id: "demo-lockshield-15",
    name: "Demo lockshield 15 mm (invented table)",
    table: [[0.5, 0.1], [1, 0.22], [1.5, 0.38], [2, 0.56], [2.5, 0.74], [3, 0.9], [3.5, 1.02], [4, 1.1]],
  },
  {
    id: "demo-balancing-20",
    name: "Demo balancing valve 20 mm (invented table)",
    table: [[0.5, 0.25], [1, 0.6], [2, 1.3], [3, 2.1], [4, 2.9], [5, 3.6], [6, 4.2], [8, 5.0]],
  },
] as const satisfies readonly ValveModel[];

export type ValveModelId = (typeof valveModels)[number]["id"];
/** "none" first, so a form's first option means no model named. */
export const valveModelOptions = ["none", ...valveModels.map((m) => m.id)] as ["none", ...ValveModelId[]];

export function valveModel(id: string | null | undefined): ValveModel | null {
  return valveModels.find((m) => m.id === id) ?? null;
}

export type TurnsReading =
  | { ok: true; turns: number }
  | { ok: false; reason: "below-range" | "above-range"; limitKv: number };

/**
 * Turns open for a wanted Kv, by straight-line interpolation between the two rows
 * of the table around it (how a maker's printed table is read between rows;
 * common practice). Outside the table the valve cannot give that Kv.
 */
export function turnsForKv(model: ValveModel, kv: number): TurnsReading {
  const t = model.table;
  const first = t[0]!;
  const last = t[t.length - 1]!;
  if (kv < first[1]) return { ok: false, reason: "below-range", limitKv: first[1] };
  if (kv > last[1]) return { ok: false, reason: "above-range", limitKv: last[1] };
  for (let i = 1; i < t.length; i++) {
    const [n0, k0] = t[i - 1]!;
    const [n1, k1] = t[i]!;
    if (kv <= k1) return { ok: true, turns: n0 + ((kv - k0) / (k1 - k0)) * (n1 - n0) };
  }
  return { ok: true, turns: last[0] };
}
