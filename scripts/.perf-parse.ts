import { parseSchematic } from "@/lib/schematic/parse";
import { migrate } from "@/lib/schematic/migrate";
import { schematicSchema } from "@/lib/schematic/schema";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const input = generateBuildingWithPipes(Number(process.argv[2] ?? 2000));
const cpu = () => { const c = process.cpuUsage(); return (c.user + c.system) / 1000; };
const acc: Record<string, number[]> = {};
const time = (k: string, f: () => unknown) => { const t = cpu(); const r = f(); (acc[k] ??= []).push(cpu() - t); return r; };
for (let i = 0; i < 15; i++) {
  const m = time("migrate", () => migrate(input)) as { ok: true; doc: unknown };
  time("zod", () => schematicSchema.safeParse(m.doc));
  time("parse", () => parseSchematic(input));
}
for (const k in acc) console.log(k.padEnd(14), acc[k]!.slice(3).sort((a, b) => a - b).map((x) => x.toFixed(1)).join(" "));
