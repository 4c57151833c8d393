/**
 * CLI: `npm run --silent calc -- FILE.json` — results JSON on stdout, exit 0
 * when calculated (findings or not); exit 2 with one readable line per fault
 * (JSON path and what is wrong) when the file cannot be read, is not JSON, or
 * is not a valid schematic.
 */
import { readFileSync } from "node:fs";
import { calculate } from "@/lib/hydraulics";

function fail(lines: string[]): never {
  for (const line of lines) process.stderr.write(`${line}\n`);
  process.exit(2);
}

// A closed pipe (`… | head`) is the reader's choice, not a failure.
process.stdout.on("error", (e: NodeJS.ErrnoException) => {
  if (e.code === "EPIPE") process.exit(0);
  throw e;
});

function main(argv: string[]): void {
  const file = argv.find((a) => a !== "--");
  if (!file) fail(["usage: npm run --silent calc -- FILE.json"]);
  let text: string;
  try {
    text = readFileSync(file, "utf8");
  } catch (e) {
    fail([`${file}: cannot read the file (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`]);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    fail([`${file}: not valid JSON (${(e as Error).message})`]);
  }
  const answer = calculate(json);
  if (!answer.ok) fail([`${file}: not a valid schematic:`, ...answer.issues.map((i) => `  ${i.message}`)]);
  process.stdout.write(`${JSON.stringify(answer.results, null, 2)}\n`);
}

main(process.argv.slice(2));
