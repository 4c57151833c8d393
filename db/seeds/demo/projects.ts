import fs from "node:fs";
import path from "node:path";

// The two invented demo projects. Their schematics come from db/seeds/data/*.json;
// a placeholder stands in while a file is missing so the seed never fails.
type DemoSchematic = { name: string; file: string; kind?: "team" | "practice"; status: "draft" | "in-review" | "approved" | "issued" };

export const demoProjects: { id: string; name: string; client: string; clientEmail: string; site: string; design: Record<string, unknown>; schematics: DemoSchematic[] }[] = [
  {
    id: "6a0f3c1e-0000-4000-8000-000000000101",
    name: "Millbrook Community Hall",
    client: "Millbrook Hall Trust",
    clientEmail: "trustees@millbrook-hall.example",
    site: "Hall and annexe, 3 Weir Lane, Millbrook (invented)",
    // the project's design conditions: what its new schematics start with (lib/schematic/project-defaults.ts)
    design: { fluid: { kind: "water" }, design: { flowTemperatureC: 45, returnTemperatureC: 40, minOutdoorTemperatureC: -3, hotWaterFlowTemperatureC: 55 } },
    schematics: [{ name: "Plant room", file: "millbrook-hall.json", status: "issued" }],
  },
  {
    id: "6a0f3c1e-0000-4000-8000-000000000102",
    name: "Orchard End",
    client: "The Orchard End household",
    clientEmail: "household@orchard-end.example",
    site: "Detached house, Orchard End, Lower Alder (invented)",
    design: { fluid: { kind: "water" }, design: { flowTemperatureC: 45, returnTemperatureC: 40, minOutdoorTemperatureC: -2, hotWaterFlowTemperatureC: 55 } },
    schematics: [
      { name: "Bypass only", file: "orchard-end-bypass-only.json", status: "in-review" },
      { name: "With 40 L buffer", file: "orchard-end-buffer-40l.json", status: "draft" },
    ],
  },
];

export function loadDemoDocument(file: string, name: string): Record<string, unknown> {
  const full = path.join(process.cwd(), "db/seeds/data", file);
  if (fs.existsSync(full)) return JSON.parse(fs.readFileSync(full, "utf8"));
  return { format: "loopwright/schematic", version: 1, name, fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 40, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1, targetGradientPaPerM: 200 },
    parts: [], pipes: [] };
}
