/**
 * The plant room of a first draft: heat source with isolation valves both
 * ways, safety valve and air vent on the flow, the circulator, a diverter to
 * the hot-water cylinder's coil when there is one, then the separation — a
 * differential-pressure bypass between the mains, or a buffer / low-loss
 * header with its own secondary pump — and on the return the filter,
 * expansion vessel and drain cock. Kv values and the pump curve are set
 * later from the engine's flows (size.ts). Returns where the zones join.
 */
import { FACING, type DraftBuilder } from "./builder";
import { STEP, Y } from "./layout";
import type { Plant } from "./plant";
import { BUFFER_L_PER_KW, BUFFER_SERIES_L, LENGTH, nextInSeries } from "./rules";

export interface ZoneAnchors {
  /** Port the first zone take-off is piped from (flow). */
  flowOut: string;
  /** Port the return main ends in. */
  returnIn: string;
  /** x where the zones start. */
  x0: number;
}

const PLACEHOLDER_CURVE = [[0, 60], [1.5, 45], [3, 0]];

export function drawPlantRoom(b: DraftBuilder, plant: Plant): ZoneAnchors {
  const hs = plant.heatSource;
  const kindWord = hs.kind === "heat-pump" ? "Heat pump" : "Boiler";
  const cyl = plant.hotWaterCylinderL !== null;
  const x = (i: number) => 200 + STEP.plant * i;

  b.part("hs", hs.kind, { x: 60, y: Y.MID }, `${kindWord} ${hs.ratedOutputKw} kW`, {
    ratedOutputKw: hs.ratedOutputKw, minFlowM3h: hs.minFlowM3h, kv: hs.kv, waterVolumeL: hs.waterVolumeL, minSystemVolumeL: hs.minSystemVolumeL, pumpCurve: null,
  });
  // Flow main, left to right.
  b.part("iso-f", "isolation-valve", { x: x(0), y: Y.FLOW }, "Isolation valve, flow", { open: true }, FACING.ltr);
  b.part("t-sv", "tee", { x: x(1), y: Y.FLOW }, "Tee, safety valve", {}, FACING.teeUp);
  b.part("sv", "safety-valve", { x: x(1), y: Y.ABOVE }, "Safety valve 3 bar", { setBar: 3 });
  b.part("t-av", "tee", { x: x(2), y: Y.FLOW }, "Tee, air vent", {}, FACING.teeUp);
  b.part("av", "air-vent", { x: x(2), y: Y.ABOVE }, "Automatic air vent (plant high point)");
  const separated = plant.separation !== "bypass";
  b.part("pump", "pump", { x: x(3), y: Y.FLOW }, separated ? "Primary circulator" : "Circulator", { curve: PLACEHOLDER_CURVE }, FACING.ltr);
  b.pipe("p-hs-f", "hs.flow", "iso-f.a", LENGTH.sourceLeg, { elbow: 3 });
  b.pipe("p-f1", "iso-f.b", "t-sv.a", LENGTH.plant);
  b.pipe("p-f2", "t-sv.b", "t-av.a", LENGTH.plant, { teeRun: 1 });
  b.pipe("p-f3", "t-av.b", "pump.in", LENGTH.plant, { teeRun: 1 });
  b.pipe("p-sv", "t-sv.c", "sv.connection", LENGTH.accessory, { teeBranch: 1 }, "15");
  b.pipe("p-av", "t-av.c", "av.connection", LENGTH.accessory, { teeBranch: 1 }, "15");
  let flowEnd = "pump.out";
  if (cyl) {
    b.part("div", "diverter-valve", { x: 620, y: Y.FLOW }, "Diverter, heating / hot water", { position: "a" });
    b.part("cyl", "cylinder", { x: 540, y: Y.MID }, `Hot-water cylinder ${plant.hotWaterCylinderL} L`, {
      volumeL: plant.hotWaterCylinderL, coilOutputKw: hs.ratedOutputKw, storeTemperatureC: 60, coldWaterC: 10,
    });
    b.pipe("p-f4", "pump.out", "div.ab", LENGTH.plant);
    b.pipe("p-coil-f", "div.b", "cyl.coilFlow", LENGTH.coil, { elbow: 3 });
    flowEnd = "div.a";
  }
  // Return main, right to left, from the separation (or the cylinder tee) back to the heat source.
  b.part("flt", "strainer", { x: 520, y: Y.RETURN }, "Filter on the return (magnetic)", {}, FACING.rtl);
  b.part("t-ev", "tee", { x: x(2), y: Y.RETURN }, "Tee, expansion vessel", {}, FACING.returnTeeDown);
  b.part("ev", "expansion-vessel", { x: x(2), y: Y.BELOW }, "Expansion vessel", {}, FACING.portUp);
  b.part("t-dc", "tee", { x: x(1), y: Y.RETURN }, "Tee, drain (plant low point)", {}, FACING.returnTeeDown);
  b.part("dc", "drain-cock", { x: x(1), y: Y.BELOW - 20 }, "Drain cock (plant low point)");
  b.part("iso-r", "isolation-valve", { x: x(0), y: Y.RETURN }, "Isolation valve, return", { open: true }, FACING.rtl);
  b.pipe("p-r3", "flt.b", "t-ev.a", LENGTH.plant);
  b.pipe("p-r2", "t-ev.b", "t-dc.a", LENGTH.plant, { teeRun: 1 });
  b.pipe("p-r1", "t-dc.b", "iso-r.a", LENGTH.plant, { teeRun: 1 });
  b.pipe("p-hs-r", "iso-r.b", "hs.return", LENGTH.sourceLeg, { elbow: 3 });
  b.pipe("p-ev", "t-ev.c", "ev.connection", LENGTH.vesselLeg, { teeBranch: 1, elbow: 1 }, "22");
  b.pipe("p-dc", "t-dc.c", "dc.connection", LENGTH.accessory, { teeBranch: 1 }, "15");
  let returnEnd = "flt.a";
  if (cyl) {
    b.part("t-cyl", "tee", { x: 640, y: Y.RETURN }, "Tee, cylinder coil return", {}, FACING.returnTeeUp);
    b.pipe("p-coil-r", "cyl.coilReturn", "t-cyl.c", LENGTH.coil, { elbow: 3, teeBranch: 1 });
    b.pipe("p-r4", "t-cyl.b", "flt.a", LENGTH.plant, { teeRun: 1 });
    returnEnd = "t-cyl.a";
  }
  const sepX = cyl ? 780 : 660;
  if (!separated) {
    b.part("t-bpf", "tee", { x: sepX, y: Y.FLOW }, "Tee, bypass flow", {}, FACING.teeDown);
    b.part("bp", "dp-bypass-valve", { x: sepX, y: Y.MID }, "Differential-pressure bypass", {}, FACING.down);
    b.part("t-bpr", "tee", { x: sepX, y: Y.RETURN }, "Tee, bypass return", {}, FACING.returnTeeUp);
    b.pipe("p-f5", flowEnd, "t-bpf.a", LENGTH.plant, cyl ? {} : { elbow: 0 });
    b.pipe("p-bp-f", "t-bpf.c", "bp.a", LENGTH.plant, { teeBranch: 1, elbow: 1 });
    b.pipe("p-bp-r", "bp.b", "t-bpr.c", LENGTH.plant, { teeBranch: 1, elbow: 1 });
    b.pipe("p-r5", "t-bpr.b", returnEnd, LENGTH.plant, { teeRun: 1 });
    return { flowOut: "t-bpf.b", returnIn: "t-bpr.a", x0: sepX + 140 };
  }
  const buffer = plant.separation === "buffer";
  const volumeL = buffer ? nextInSeries(BUFFER_SERIES_L, Math.max(BUFFER_L_PER_KW * hs.ratedOutputKw, hs.minSystemVolumeL ?? 0)) : 2;
  b.part("hdr", buffer ? "buffer-vessel" : "low-loss-header", { x: sepX, y: Y.MID }, buffer ? `Buffer vessel ${volumeL} L` : "Low-loss header", { volumeL });
  b.part("pump-s", "pump", { x: sepX + 160, y: Y.FLOW }, "Secondary circulator (heating)", { curve: PLACEHOLDER_CURVE }, FACING.ltr);
  b.pipe("p-f5", flowEnd, "hdr.p1", LENGTH.plant, { elbow: 2 });
  b.pipe("p-r5", "hdr.p2", returnEnd, LENGTH.plant, { elbow: 2 });
  b.pipe("p-s1", "hdr.p3", "pump-s.in", LENGTH.plant, { elbow: 2 });
  return { flowOut: "pump-s.out", returnIn: "hdr.p4", x0: sepX + 300 };
}
