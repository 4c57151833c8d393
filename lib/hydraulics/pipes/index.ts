/**
 * Pipes: the pipe catalogue (copper EN 1057, steel EN 10255, PE-X and
 * multilayer; inner diameter and roughness per size) and the Darcy–Weisbach
 * pressure drop of a pipe with its fittings, plus d(Δp)/dQ for Newton solvers.
 */
export * from "./catalogue";
export * from "./pressure-drop";
