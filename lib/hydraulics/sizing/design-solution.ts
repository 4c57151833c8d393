/** What solving a mode at design flows gives: the state, the loads, the link laws and the solved flows and heads. */
import type { LinkTable } from "@/lib/hydraulics/network/behaviour";
import type { NetworkState } from "./laws";
import type { DesignLoad } from "./loads";

export interface DesignSolution {
  mode: NetworkState["mode"];
  state: NetworkState;
  loads: DesignLoad[];
  /** loads with a path from inlet back to outlet (the others get no flow) */
  served: DesignLoad[];
  laws: LinkTable;
  q: Float64Array;
  head: Float64Array;
}
