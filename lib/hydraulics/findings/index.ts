/**
 * findings — errors, warnings and notes with stable codes and the schematic
 * ids they concern. topology.ts: how the schematic is put together; plant.ts:
 * plant-room checks (zones, strainer, isolation, frost, pressures); flow-sides.ts:
 * the flow and return sides each port sits on (for sizing/direction.ts). Findings
 * that need numbers are raised where the numbers are made (sizing/, scenarios/).
 */
export { Findings, finding, type Finding, type Severity } from "./finding";
export { topologyFindings } from "./topology";
export { plantFindings } from "./plant";
