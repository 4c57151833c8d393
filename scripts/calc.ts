/**
 * CLI: `npm run --silent calc -- FILE.json` — results JSON on stdout, exit 0
 * when calculated (findings or not); exit 2 with one readable line per fault
 * (JSON path and what is wrong) when the file cannot be read, is not JSON, or
 * is not a valid schematic.
 */
import { calculate } from "@/lib/hydraulics";
import { exitQuietlyOnClosedPipe, fail, readJson } from "./cli-io";

exitQuietlyOnClosedPipe();

function main(argv: string[]): void {
  const file = argv.find((a) => a !== "--");
  if (!file) fail(["usage: npm run --silent calc -- FILE.json"]);
  const answer = calculate(readJson(file));
  if (!answer.ok) fail([`${file}: not a valid schematic:`, ...answer.issues.map((i) => `  ${i.message}`)]);
  process.stdout.write(`${JSON.stringify(answer.results, null, 2)}\n`);
}

main(process.argv.slice(2));
