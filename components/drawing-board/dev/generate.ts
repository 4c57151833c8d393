/**
 * A large synthetic building for the performance page and test: `units` zone
 * units, each tee → zone valve → radiator → balancing valve → tee, chained
 * along flow and return rings. 5 parts and 6 pipes per unit, so 200 units
 * give the 1,000 parts / 1,200 pipes of the speed target.
 */
import type { Part, Pipe, Schematic } from "@/lib/schematic";
import { schematicSchema } from "@/lib/schematic";

export function generateBuildingWithPipes(units = 200, columns = 20): Schematic {
  const parts: Record<string, unknown>[] = [];
  const pipes: Record<string, unknown>[] = [];
  const pipe = (from: string, to: string, size = "15", lengthM = 2) =>
    pipes.push({ id: `p${pipes.length + 1}`, from, to, material: "copper", size, lengthM });
  for (let i = 0; i < units; i++) {
    const x = (i % columns) * 160;
    const y = Math.floor(i / columns) * 440;
    parts.push(
      { id: `tf${i}`, type: "tee", x, y },
      { id: `zv${i}`, type: "zone-valve", x, y: y + 80 },
      { id: `rad${i}`, type: "radiator", x, y: y + 180, props: { heatLoadW: 800 + (i % 7) * 100 } },
      { id: `bv${i}`, type: "balancing-valve", x, y: y + 280, rotation: 90 },
      { id: `tr${i}`, type: "tee", x, y: y + 360 },
    );
    pipe(`tf${i}.c`, `zv${i}.a`);
    pipe(`zv${i}.b`, `rad${i}.flow`);
    pipe(`rad${i}.return`, `bv${i}.a`);
    pipe(`bv${i}.b`, `tr${i}.c`);
    const next = (i + 1) % units; // the last unit closes both rings
    pipe(`tf${i}.b`, `tf${next}.a`, "28", 4);
    pipe(`tr${next}.a`, `tr${i}.b`, "28", 4);
  }
  return schematicSchema.parse({ format: "loopwright/schematic", version: 1, name: `Generated building — ${units * 5} parts`, parts: parts as Part[], pipes: pipes as Pipe[] });
}
