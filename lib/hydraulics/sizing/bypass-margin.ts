/**
 * The margin a dp-bypass opening keeps above the Δp it must hold shut
 * (bypass.ts): max(10 %, 2 kPa) — common practice, not a standard value.
 * In its own file so the report's working can show the same rule without the engine.
 */
export const BYPASS_MARGIN_FRACTION = 0.1;
export const BYPASS_MARGIN_MIN_KPA = 2;
export const BYPASS_RULE =
  "common practice: open above the larger of the zones' design Δp and the Δp the pump puts across the valve with every zone open, plus max(10 %, 2 kPa)";
