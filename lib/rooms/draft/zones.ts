/**
 * The zones of a first draft, side by side to the right of the plant room:
 * a take-off tee on the flow main, the zone valve, the zone's flow run with a
 * tee down to each emitter and an air vent at its far end (the high point),
 * the return run back with a drain cock at its far end (the low point), and a
 * tee on the return main below the zone's first emitter. The last zone takes
 * the end of each main instead of a tee. Lengths by the rules in rules.ts.
 */
import type { Room } from "../schema";
import { FACING, type DraftBuilder } from "./builder";
import type { EmitterSlot } from "./emitters";
import { STEP, Y } from "./layout";
import type { ZoneAnchors } from "./plant-room";
import { LENGTH, roomRunM } from "./rules";

export interface DraftZone {
  name: string;
  emitters: { room: Room; slot: EmitterSlot }[];
}

export function drawZones(b: DraftBuilder, zones: readonly DraftZone[], anchors: ZoneAnchors): void {
  let x0 = anchors.x0;
  let flowFrom = anchors.flowOut;
  let returnTo = anchors.returnIn;
  zones.forEach((zone, k) => {
    const z = `z${k + 1}`;
    const last = k === zones.length - 1;
    const ex = (j: number) => x0 + 80 + STEP.emitter * j; // emitter centres
    // Flow main take-off and zone valve (vertical, a on top).
    if (!last) {
      b.part(`${z}-tf`, "tee", { x: x0, y: Y.FLOW }, `Tee, ${zone.name} flow`, {}, FACING.teeDown);
      b.pipe(`${z}-main-f`, flowFrom, `${z}-tf.a`, LENGTH.main, { teeRun: 1 });
    }
    b.part(`${z}-zv`, "zone-valve", { x: x0, y: Y.VALVE }, `Zone valve — ${zone.name}`, { open: true }, FACING.down);
    if (last) b.pipe(`${z}-main-f`, flowFrom, `${z}-zv.a`, LENGTH.main, { elbow: 1 });
    else b.pipe(`${z}-zv-f`, `${z}-tf.c`, `${z}-zv.a`, LENGTH.accessory, { teeBranch: 1 });
    // Flow run: zone valve → tee per emitter → air vent at the end.
    let runFrom = `${z}-zv.b`;
    zone.emitters.forEach(({ room, slot }, j) => {
      const e = `${z}-e${j + 1}`;
      const len = j === 0 ? LENGTH.zoneRun : roomRunM(zone.emitters[j - 1]!.room.floorAreaM2);
      b.part(`${e}-tf`, "tee", { x: ex(j) - 20, y: Y.ZONE_FLOW }, `Tee, ${slot.label} flow`, {}, FACING.teeDown);
      b.part(e, slot.type, { x: ex(j), y: Y.MID }, slot.label, slot.props);
      b.pipe(`${e}-run-f`, runFrom, `${e}-tf.a`, len, j === 0 ? { elbow: 4 } : { teeRun: 1 });
      b.pipe(`${e}-tail-f`, `${e}-tf.c`, `${e}.flow`, LENGTH.tail, { teeBranch: 1, elbow: 2 }, "15");
      runFrom = `${e}-tf.b`;
      // Return: the first emitter's tee turns down to the main (a top, c right, b bottom).
      const first = j === 0;
      b.part(`${e}-tr`, "tee", { x: ex(j) + 20, y: Y.ZONE_RETURN }, `Tee, ${slot.label} return`, {}, first ? FACING.teeCorner : FACING.returnTeeUp);
      b.pipe(`${e}-tail-r`, `${e}.return`, first ? `${e}-tr.a` : `${e}-tr.c`, LENGTH.tail, { teeBranch: 1, elbow: 2 }, "15");
      if (!first) b.pipe(`${e}-run-r`, `${e}-tr.b`, j === 1 ? `${z}-e1-tr.c` : `${z}-e${j}-tr.a`, len, { teeRun: 1 });
    });
    const n = zone.emitters.length;
    const lastTee = `${z}-e${n}-tr`;
    b.part(`${z}-av`, "air-vent", { x: ex(n - 1) + 60, y: Y.VENT }, `Air vent — ${zone.name} (high point)`);
    b.pipe(`${z}-av-p`, runFrom, `${z}-av.connection`, LENGTH.runEnd, { elbow: 1 }, "15");
    b.part(`${z}-dc`, "drain-cock", { x: ex(n - 1) + 60, y: Y.DRAIN }, `Drain cock — ${zone.name} (low point)`);
    b.pipe(`${z}-dc-p`, `${z}-dc.connection`, n === 1 ? `${lastTee}.c` : `${lastTee}.a`, LENGTH.runEnd, { elbow: 1 }, "15");
    // Return drop to the main: a tee below the first emitter's return, or the main's end for the last zone.
    const drop = `${z}-e1-tr.b`;
    if (!last) {
      b.part(`${z}-tr`, "tee", { x: ex(0) + 20, y: Y.RETURN }, `Tee, ${zone.name} return`, {}, FACING.returnTeeUp);
      b.pipe(`${z}-drop-r`, drop, `${z}-tr.c`, LENGTH.zoneRun, { teeBranch: 1, elbow: 4 });
      b.pipe(`${z}-main-r`, `${z}-tr.b`, returnTo, LENGTH.main, { teeRun: 1 });
      returnTo = `${z}-tr.a`;
      flowFrom = `${z}-tf.b`;
    } else {
      b.pipe(`${z}-drop-r`, drop, returnTo, LENGTH.zoneRun + LENGTH.main, { elbow: 5 });
    }
    x0 = ex(n - 1) + 60 + STEP.zoneGap + 40;
  });
}
