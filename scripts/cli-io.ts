// Shared by the command-line tools (calc, draft): one readable line per fault and exit 2,
// files read with the reason they could not be, and a closed stdout (`… | head`) that is
// the reader's choice, not a failure.
import { readFileSync } from "node:fs";

export function fail(lines: string[]): never {
  for (const line of lines) process.stderr.write(`${line}\n`);
  process.exit(2);
}

export function exitQuietlyOnClosedPipe(): void {
  process.stdout.on("error", (e: NodeJS.ErrnoException) => {
    if (e.code === "EPIPE") process.exit(0);
    throw e;
  });
}

export function readText(file: string): string {
  try {
    return readFileSync(file, "utf8");
  } catch (e) {
    fail([`${file}: cannot read the file (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`]);
  }
}

export function readJson(file: string): unknown {
  const text = readText(file);
  try {
    return JSON.parse(text);
  } catch (e) {
    fail([`${file}: not valid JSON (${(e as Error).message})`]);
  }
}
