/**
 * CLI: `npm run --silent draft -- ROOMS.json PLANT.json [--emitters LIST.csv] > schematic.json`
 * — a first-draft schematic (contract format) on stdout, exit 0; the draft's own
 * findings and the engine's errors and warnings on it, one per line, on stderr.
 * Exit 2 with one line per fault (file, JSON path, what is wrong) when a file cannot
 * be read or the rooms or plant are not valid.
 */
import { generateDraft } from "@/lib/rooms/draft";
import { importEmitterCsv } from "@/lib/rooms/emitter-list-csv";
import { exitQuietlyOnClosedPipe, fail, readJson, readText } from "./cli-io";

exitQuietlyOnClosedPipe();

function main(argv: string[]): void {
  const args = argv.filter((a) => a !== "--");
  const at = args.indexOf("--emitters");
  const listFile = at >= 0 ? args[at + 1] : undefined;
  const [roomsFile, plantFile] = at >= 0 ? args.filter((_, i) => i !== at && i !== at + 1) : args;
  if (!roomsFile || !plantFile || (at >= 0 && !listFile)) fail(["usage: npm run --silent draft -- ROOMS.json PLANT.json [--emitters LIST.csv] > schematic.json"]);
  let emitterList: ReturnType<typeof importEmitterCsv>["emitters"] = [];
  if (listFile) {
    const list = importEmitterCsv(readText(listFile));
    if (list.issues.length) fail([`${listFile}: not a valid emitter list:`, ...list.issues.map((i) => `  line ${i.line}, ${i.column || "row"}: ${i.message}`)]);
    emitterList = list.emitters;
  }
  const out = generateDraft(readJson(roomsFile), readJson(plantFile), { emitterList });
  if (!out.ok) fail([`${roomsFile} + ${plantFile}: no draft:`, ...out.issues.map((i) => `  ${i.message}`)]);
  const { schematic, results, findings } = out.draft;
  for (const f of [...findings, ...results.findings.filter((x) => x.severity !== "info")]) process.stderr.write(`${f.severity} ${f.code}: ${f.message}\n`);
  process.stdout.write(`${JSON.stringify(schematic, null, 2)}\n`);
}

main(process.argv.slice(2));
