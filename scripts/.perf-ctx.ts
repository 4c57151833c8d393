import { parseSchematic } from "@/lib/schematic/parse";
import { buildModel } from "@/lib/hydraulics/network/model";
import { prepare } from "@/lib/hydraulics/network/gga";
import { createContext } from "@/lib/hydraulics/sizing/context";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const input = generateBuildingWithPipes(Number(process.argv[2] ?? 20000));
const p = parseSchematic(input); if (!p.ok) throw 0;
const doc = p.doc;
const cpu = () => { const c = process.cpuUsage(); return (c.user + c.system) / 1000; };
const acc: Record<string, number[]> = {};
const time = (k: string, f: () => unknown) => { const t = cpu(); const r = f(); (acc[k] ??= []).push(cpu() - t); return r; };
for (let i = 0; i < 7; i++) {
  const model = time("buildModel", () => buildModel(doc)) as ReturnType<typeof buildModel>;
  time("prepare", () => prepare({ nodeCount: model.nodeCount, from: Int32Array.from(model.links, (l) => l.from), to: Int32Array.from(model.links, (l) => l.to), fixed: model.fixed }));
  time("createContext", () => createContext(doc, new Findings()));
  time("parse", () => parseSchematic(input));
}
for (const k in acc) console.log(k.padEnd(14), acc[k]!.slice(2).sort((a, b) => a - b).map((x) => x.toFixed(0)).join(" "));
