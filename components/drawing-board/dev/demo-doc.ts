/**
 * A small built-in plant room for the preview page (and tests) when no seed
 * document is at hand: heat pump, pump, two zones with radiators, bypass and
 * expansion vessel.
 */
import { parseSchematic, type Schematic } from "@/lib/schematic";

const raw = {
  format: "loopwright/schematic",
  version: 1,
  name: "Demo — two zones",
  parts: [
    { id: "hp1", type: "heat-pump", x: 80, y: 300, label: "Heat pump 7 kW", props: { ratedOutputKw: 7 } },
    { id: "pump1", type: "pump", x: 240, y: 160 },
    { id: "t1", type: "tee", x: 400, y: 160 },
    { id: "zv1", type: "zone-valve", x: 540, y: 160 },
    { id: "zv2", type: "zone-valve", x: 400, y: 300 },
    { id: "rad1", type: "radiator", x: 700, y: 160, label: "Lounge" },
    { id: "rad2", type: "radiator", x: 700, y: 300, label: "Bedroom" },
    { id: "t2", type: "tee", x: 400, y: 460 },
    { id: "ev1", type: "expansion-vessel", x: 240, y: 560 },
  ],
  pipes: [
    { id: "p1", from: "hp1.flow", to: "pump1.in", material: "copper", size: "22", lengthM: 3 },
    { id: "p2", from: "pump1.out", to: "t1.a", material: "copper", size: "22", lengthM: 1 },
    { id: "p3", from: "t1.b", to: "zv1.a", material: "copper", size: "22", lengthM: 1 },
    { id: "p4", from: "zv1.b", to: "rad1.flow", material: "copper", size: "15", lengthM: 6 },
    { id: "p5", from: "t1.c", to: "zv2.a", material: "copper", size: "22", lengthM: 1 },
    { id: "p6", from: "zv2.b", to: "rad2.flow", material: "copper", size: "15", lengthM: 8 },
    { id: "p7", from: "rad1.return", to: "t2.b", material: "copper", size: "15", lengthM: 9 },
    { id: "p8", from: "rad2.return", to: "t2.c", material: "copper", size: "15", lengthM: 7 },
    { id: "p9", from: "t2.a", to: "hp1.return", material: "copper", size: "22", lengthM: 3 },
  ],
};

export function demoDoc(): Schematic {
  const parsed = parseSchematic(raw);
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
  return parsed.doc;
}
