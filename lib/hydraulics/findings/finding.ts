/**
 * Findings: errors, warnings and notes with a stable `code` (e.g.
 * `pipe.velocity-high`) and the schematic ids they concern in `refs`.
 * Codes are part of the contract: the drawing board and report key on them.
 */
import type { Finding, Severity } from "@/lib/schematic/results";

export type { Finding, Severity };

export function finding(severity: Severity, code: string, message: string, refs: readonly string[] = []): Finding {
  return { severity, code, message, refs: [...refs] };
}

/** Collects findings; one collector per calculation (no module state). */
export class Findings {
  readonly list: Finding[] = [];
  private seen = new Set<string>();
  add(severity: Severity, code: string, message: string, refs: readonly string[] = []): void {
    const key = `${code}|${refs.join(",")}|${message}`;
    if (this.seen.has(key)) return;
    this.seen.add(key);
    this.list.push(finding(severity, code, message, refs));
  }
  error(code: string, message: string, refs: readonly string[] = []) {
    this.add("error", code, message, refs);
  }
  warning(code: string, message: string, refs: readonly string[] = []) {
    this.add("warning", code, message, refs);
  }
  info(code: string, message: string, refs: readonly string[] = []) {
    this.add("info", code, message, refs);
  }
}
