/**
 * Emitter output at the design temperatures (EN 442-2 log-mean characteristic,
 * emitters/en442.ts) against the room's heat load, and the cylinder's reheat
 * time (hot-water/cylinder.ts) with the coil limited to what the heat source
 * can deliver.
 */
import { cylinderReheatMinutes } from "@/lib/hydraulics/hot-water";
import type { Results } from "@/lib/schematic/results";
import type { EngineContext } from "./context";
import { radiatorDesignOutputW, ratedSourceW } from "./loads";

export function emitterResults(ctx: EngineContext): Results["emitters"] {
  const out: Results["emitters"] = [];
  for (const part of ctx.doc.parts) {
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
  return out;
}

export function hotWaterResult(ctx: EngineContext): Results["hotWater"] {
  const cyl = ctx.doc.parts.find((p) => p.type === "cylinder");
  if (!cyl || cyl.type !== "cylinder") return null;
  const source = ratedSourceW(ctx) / 1000;
  const coil = source > 0 ? Math.min(cyl.props.coilOutputKw, source) : cyl.props.coilOutputKw;
  let minutes: number | null = null;
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
  if (cyl.props.storeTemperatureC < 60) {
    ctx.findings.warning(
      "hot-water.store-cool",
      `${cyl.id}: store at ${cyl.props.storeTemperatureC} °C; legionella control asks for ≥ 60 °C storage (HSE ACoP L8 / HSG274 Part 2)`,
      [cyl.id],
    );
  }
  return { id: cyl.id, reheatMinutes: minutes !== null && Number.isFinite(minutes) ? minutes : null };
}
