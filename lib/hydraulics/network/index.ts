/**
 * network — the hydraulic network and its solver. model.ts turns a schematic
 * into nodes (ports; a junction's ports share one) and links (pipes and
 * through-parts); behaviour.ts holds each link's head-loss law; gga.ts is the
 * gradient method (Todini & Pilati 1988, as in EPANET — Rossman, EPANET 2.2
 * manual §12) over a sparse LDLᵀ factorisation (ldl.ts, up-looking on the
 * elimination tree) with unknowns numbered in minimum-degree order
 * (ordering.ts), kept per topology (topology-cache.ts). Shape: model →
 * validate → assemble → factorise → solve → check balance.
 */
export { buildModel, components, adjacency, type NetworkModel, type ModelLink, type LinkRole } from "./model";
export { prepare, solveNetwork, lawsOf, type Prepared, type Topology, type LinkLaws, type SolveResult } from "./gga";
export { LinkTable, LAW, kvCoefficient, OPEN_R, CLOSED_R, NO_FLOW_M3H, type PipeGeometry } from "./behaviour";
