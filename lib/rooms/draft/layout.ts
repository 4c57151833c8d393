/**
 * Where the draft's parts go on the board (flow pixels, 20 px grid; a part's
 * x/y is its symbol's centre). Horizontal bands, top to bottom:
 *
 *   accessories above the flow main (air vent, safety valve)   ABOVE
 *   flow main: heat source side → zone take-offs                FLOW
 *   zone valves, then each zone's flow run                      VALVE, ZONE_FLOW
 *   emitters, the cylinder, the bypass valve, a buffer/header   MID
 *   each zone's return run                                      ZONE_RETURN
 *   return main: zone returns → filter, vessel → heat source    RETURN
 *   accessories below the return main (vessel, drain)           BELOW
 *
 * Every flow pipe stays above the emitters and every return pipe below them,
 * and zones sit side by side, so flow and return runs never cross; the only
 * vertical links between the bands are the heat source, the cylinder coil,
 * the bypass and the buffer, each at its own x.
 */
export const Y = {
  ABOVE: 100,
  FLOW: 200,
  VALVE: 270,
  VENT: 290,
  ZONE_FLOW: 360,
  MID: 480,
  ZONE_RETURN: 620,
  DRAIN: 700,
  RETURN: 760,
  BELOW: 880,
} as const;

/** Spacing of parts along the plant mains and of emitters along a zone. */
export const STEP = { plant: 100, emitter: 140, zoneGap: 80 } as const;
