/**
 * Losses: local (minor) losses — fitting K values by the Crane TP-410 K = n·fT
 * method, area-change K (Crane contraction, Borda–Carnot enlargement), and
 * valve/device pressure drop from Kv per IEC 60534-1 (plus Cv conversion).
 */
export * from "./crane";
export * from "./fittings";
export * from "./kv";
