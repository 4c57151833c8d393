/**
 * CLI: `npm run --silent optimise -- FILE.json [OPTIONS.json]` — the cheapest
 * pipe sizes for a schematic (lib/hydraulics/optimise), as JSON on stdout:
 * {sizes, cost, before, after, feasible, findings, …}. Exit 0 when it
 * optimised (feasible or not: `feasible` and the findings say which); exit 2
 * with one readable line per fault (JSON path and what is wrong) when a file
 * cannot be read, is not JSON, or is not a valid schematic or options.
 */
import { readFileSync } from "node:fs";
import { optimise } from "@/lib/hydraulics/optimise";

function fail(lines: string[]): never {
  for (const line of lines) process.stderr.write(`${line}\n`);
  process.exit(2);
}

process.stdout.on("error", (e: NodeJS.ErrnoException) => {
  if (e.code === "EPIPE") process.exit(0);
  throw e;
});

function readJson(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, "utf8");
  } catch (e) {
    fail([`${file}: cannot read the file (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`]);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    fail([`${file}: not valid JSON (${(e as Error).message})`]);
  }
}

function main(argv: string[]): void {
  const [file, optionsFile] = argv.filter((a) => a !== "--");
  if (!file) fail(["usage: npm run --silent optimise -- FILE.json [OPTIONS.json]"]);
  const doc = readJson(file);
  const options = optionsFile ? readJson(optionsFile) : {};
  const answer = optimise(doc, options);
  if (!answer.ok) fail([`${optionsFile ? `${file} / ${optionsFile}` : file}: cannot optimise:`, ...answer.issues.map((i) => `  ${i.message}`)]);
  process.stdout.write(`${JSON.stringify(answer.result, null, 2)}\n`);
}

main(process.argv.slice(2));
