/**
 * Emitter output at the design temperatures against the room's heat load, for
 * every load except the cylinder coil, and the cylinder's reheat time
 * (hot-water/cylinder.ts) with the coil limited to what the heat source can
 * deliver.
 *
 * - radiator: EN 442-2 log-mean characteristic (emitters/en442.ts).
 * - ufh-loop: its design flow is sized to carry the heat load at the design
 *   ΔT (q = P/(ρ·cp·ΔT)), so the heat it brings is the load. With
 *   `floorAreaM2` the floor is checked with the EN 1264-2 basic
 *   characteristic q = 8.92·(θ_F,m − θ_i)^1.1 W/m² (emitters/en1264.ts): the
 *   most the floor can give is at a mean surface temperature of
 *   min(maxSurfaceTemperatureC, mean water temperature) — the surface limit
 *   (29 °C occupied zone) or, generously, the water itself. outputAtDesignW =
 *   min(load, that capacity), ok = capacity ≥ load. Without a floor area the
 *   output is the load carried by the design flow, ok is null (not checked)
 *   and one info finding `emitter.ufh-not-checked` names those loops.
 * - fan-coil, heat-load: fixed loads with no rating in the schematic; the
 *   design flow delivers the heat load by construction: outputAtDesignW =
 *   heatLoadW, ok = true.
 */
import { en1264HeatFluxWm2, en1264SurfaceTemperatureC } from "@/lib/hydraulics/emitters";
import { cylinderReheatMinutes } from "@/lib/hydraulics/hot-water";
import type { Part } from "@/lib/schematic/schema";
import type { Results } from "@/lib/schematic/results";
import type { EngineContext } from "./context";
import { radiatorDesignOutputW, ratedSourceW } from "./loads";

type Row = Results["emitters"][number];

function ufhRow(ctx: EngineContext, part: Part & { type: "ufh-loop" }, dT: number | null, unchecked: string[]): Row {
  const p = part.props;
  const load = p.heatLoadW;
  if (dT === null) return { id: part.id, outputAtDesignW: null, heatLoadW: load, ok: null };
  if (p.floorAreaM2 === null) {
    unchecked.push(part.id);
    return { id: part.id, outputAtDesignW: load, heatLoadW: load, ok: null };
  }
  const meanWaterC = ctx.flowC - dT / 2;
  const surfaceMaxC = Math.min(p.maxSurfaceTemperatureC, meanWaterC);
  const capacity = p.floorAreaM2 * en1264HeatFluxWm2(surfaceMaxC, p.roomTemperatureC);
  const ok = capacity >= load;
  if (!ok) {
    const flux = load / p.floorAreaM2;
    const needC = en1264SurfaceTemperatureC(flux, p.roomTemperatureC);
    const limit =
      surfaceMaxC < p.maxSurfaceTemperatureC
        ? `the mean water temperature ${meanWaterC.toFixed(1)} °C`
        : `the ${p.maxSurfaceTemperatureC} °C surface limit`;
    ctx.findings.warning(
      "emitter.undersized",
      `${part.id}: ${load} W on ${p.floorAreaM2} m² needs ${flux.toFixed(0)} W/m², a mean floor surface of ${needC.toFixed(1)} °C in a ${p.roomTemperatureC} °C room (EN 1264-2), above ${limit}; the floor gives at most ${capacity.toFixed(0)} W`,
      [part.id],
    );
  }
  return { id: part.id, outputAtDesignW: Number.isFinite(capacity) ? Math.min(load, capacity) : null, heatLoadW: load, ok };
}

/** `unheated`: loads no heat source reaches (findings/topology.ts unheatedLoads): output 0, not ok. */
export function emitterResults(ctx: EngineContext, unheated: ReadonlySet<string> = new Set()): Results["emitters"] {
  const out: Results["emitters"] = [];
  const unchecked: string[] = [];
  for (const part of ctx.doc.parts) {
    if (part.type === "ufh-loop") {
      out.push(ufhRow(ctx, part, part.props.deltaTK ?? ctx.deltaTK, unchecked));
      continue;
    }
    if (part.type === "fan-coil" || part.type === "heat-load") {
      const dT = part.props.deltaTK ?? ctx.deltaTK;
      const load = part.props.heatLoadW;
      out.push({ id: part.id, outputAtDesignW: dT === null ? null : load, heatLoadW: load, ok: dT === null ? null : true });
      continue;
    }
    if (part.type !== "radiator") continue;
    const dT = part.props.deltaTK ?? ctx.deltaTK;
    const output = dT === null ? null : radiatorDesignOutputW(ctx, part, dT);
    const load = part.props.heatLoadW;
    if (output === null && dT !== null) {
      ctx.findings.warning(
        "emitter.no-output",
        `${part.id}: no EN 442 output at ${ctx.flowC}/${ctx.flowC - dT} °C in a ${part.props.roomTemperatureC} °C room (return must stay above the room)`,
        [part.id],
      );
    }
    const ok = output === null || load === null ? null : output >= load;
    if (ok === false) {
      ctx.findings.warning(
        "emitter.undersized",
        `${part.id}: gives ${output!.toFixed(0)} W at ${ctx.flowC}/${ctx.flowC - dT!} °C, below the room's ${load} W`,
        [part.id],
      );
    }
    out.push({ id: part.id, outputAtDesignW: output, heatLoadW: load, ok });
  }
  for (const row of out) {
    if (!unheated.has(row.id)) continue;
    row.outputAtDesignW = 0;
    row.ok = row.heatLoadW === null ? null : row.heatLoadW <= 0;
  }
  if (unchecked.length > 0) {
    ctx.findings.info(
      "emitter.ufh-not-checked",
      `${unchecked.join(", ")}: no floor area, so the output shown is the heat load its design flow carries at the design ΔT and the floor is not checked against EN 1264 (give the heated floor area)`,
      unchecked,
    );
  }
  return out;
}

export function hotWaterResult(ctx: EngineContext): Results["hotWater"] {
  const cyl = ctx.doc.parts.find((p) => p.type === "cylinder");
  if (!cyl || cyl.type !== "cylinder") return null;
  const source = ratedSourceW(ctx) / 1000;
  const coil = source > 0 ? Math.min(cyl.props.coilOutputKw, source) : cyl.props.coilOutputKw;
  let minutes: number | null = null;
  // A heat source usually runs hotter for hot water than for heating, so the
  // heating flow temperature says nothing here; a stated highest flow
  // temperature does: water at that temperature cannot bring the store above it.
  const { hotWaterFlowTemperatureC: hw, maxFlowTemperatureC: max } = ctx.doc.design;
  const hottestC = hw ?? max;
  const field = hw !== null ? "design.hotWaterFlowTemperatureC" : "design.maxFlowTemperatureC";
  if (hottestC !== null && cyl.props.storeTemperatureC >= hottestC) {
    ctx.findings.warning(
      "hot-water.flow-too-cool",
      `${cyl.id}: store set to ${cyl.props.storeTemperatureC} °C but the hot-water flow is ${hottestC} °C, so the coil cannot reheat it (no reheat time); raise that flow temperature in Design conditions or lower the store setting`,
      [cyl.id],
      [field],
    );
  } else {
    if (hottestC === null) {
      ctx.findings.info(
        "hot-water.flow-unknown",
        `${cyl.id}: no hot-water flow temperature stated, so the reheat time assumes the heat source can bring the store to ${cyl.props.storeTemperatureC} °C; state it in Design conditions to have that checked`,
        [cyl.id],
        ["design.hotWaterFlowTemperatureC"],
      );
    }
    try {
      minutes = cylinderReheatMinutes({
        volumeL: cyl.props.volumeL,
        coldWaterC: cyl.props.coldWaterC,
        storeTemperatureC: cyl.props.storeTemperatureC,
        coilOutputKw: coil,
      });
    } catch (e) {
      ctx.findings.warning("hot-water.no-reheat", `${cyl.id}: reheat time not computed (${(e as Error).message})`, [cyl.id]);
    }
  }
  if (cyl.props.storeTemperatureC < 60) {
    ctx.findings.warning(
      "hot-water.store-cool",
      `${cyl.id}: store at ${cyl.props.storeTemperatureC} °C; legionella control asks for ≥ 60 °C storage (HSE ACoP L8 / HSG274 Part 2)`,
      [cyl.id],
    );
  }
  return { id: cyl.id, reheatMinutes: minutes !== null && Number.isFinite(minutes) ? minutes : null };
}
