import { Session } from "node:inspector";
import { writeFileSync } from "node:fs";
import { calculate } from "@/lib/hydraulics/calculate";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const doc = generateBuildingWithPipes(Number(process.argv[2] ?? 2000));
calculate(doc); calculate(doc);
const s = new Session(); s.connect();
const post = (m: string, p?: object) => new Promise<any>((res, rej) => s.post(m, p ?? {}, (e, r) => (e ? rej(e) : res(r))));
(async () => {
  await post("HeapProfiler.startSampling", { samplingInterval: 4096, includeObjectsCollectedByMajorGC: true, includeObjectsCollectedByMinorGC: true });
  for (let i = 0; i < 5; i++) calculate(doc);
  const r = await post("HeapProfiler.stopSampling");
  writeFileSync("/tmp/perf/alloc.json", JSON.stringify(r.profile));
})();
