/**
 * EPANET 2.2 (Rossman et al. 2020, EPA/600/R-20/133) through epanet-js, as the
 * cross-check tests use it: the WebAssembly engine loaded from bytes, and the
 * constants that tie EPANET's US-unit internals to SI.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { Workspace } from "epanet-js/slim";
import { EpanetEngine } from "epanet-js/engines/v2.2";

export const G_EPANET = 32.2 * 0.3048; // m/s², EPANET's g in its D-W resistance
export const NU_REF_EPANET = 1.1e-5 * 0.3048 ** 2; // m²/s, EPANET's VISCOS for SpViscos = 1
/** Kv parts become TCVs of this diameter with K = 1.598874e-3·d⁴/Kv² (d in mm). */
export const TCV_REF_DIAMETER_MM = 25;

/** Swamee & Jain (1976), as in EPANET 2.2 frictionFactor for Re ≥ 4000. */
export const swameeJain = (re: number, relRough: number) => 0.25 / Math.log10(relRough / 3.7 + 5.74 / re ** 0.9) ** 2;

export async function loadEpanet(): Promise<Workspace> {
  const require = createRequire(path.resolve("package.json"));
  const wasm = path.join(path.dirname(require.resolve("epanet-js/engines/v2.2")), "EpanetEngine.wasm");
  const workspace = new Workspace();
  // The engine's own file-URL fetch fails under Node; hand it the bytes (setup-notes.md).
  await workspace.loadModuleVersion(() => EpanetEngine({ wasmBinary: readFileSync(wasm) }) as never);
  return workspace;
}
