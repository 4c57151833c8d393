// Shapes of the site sheet as the API sends it and the phone keeps it (client-safe).

/** One setting to make on site, with the number the design gives and where it came from. */
export interface SiteSetting {
  key: string;
  label: string;
  /** e.g. "Kv 0.67" or "30.0 kPa" */
  value: string;
  /** turns, metres head, recommended value … */
  detail?: string;
  /** something the installer must look at (value outside a valve's range, set below recommended) */
  warn?: string;
}

export interface PipeRow {
  kind: "pipe";
  id: string;
  /** "Heat pump → Isolation valve, heat pump flow" */
  runs: string;
  material: string;
  size: string;
  lengthM: number;
  /** "3 elbows, 1 tee (run)" or "" */
  fittings: string;
  flowM3h: number | null;
  velocityMps: number | null;
}

export interface PartRow {
  kind: "part";
  id: string;
  type: string;
  label: string;
  settings: SiteSetting[];
  /** a caution to show beside this part (hot water, pressure) */
  caution?: string;
}

export type SiteRow = PipeRow | PartRow;

export interface SiteGroup {
  id: string;
  title: string;
  kind: "shared" | "circuit" | "other";
  /** row ids in the order they are met along the circuit */
  rows: string[];
}

export interface TickState {
  ticked: boolean;
  by: string | null;
  at: string;
  eventId: string;
}
