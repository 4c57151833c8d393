/**
 * Findings: errors, warnings and notes with a stable `code` (e.g.
 * `pipe.velocity-high`) and the schematic ids they concern in `refs`.
 * Codes are part of the contract: the drawing board and report key on them.
 */
import type { Finding, Severity } from "@/lib/schematic/results";

export type { Finding, Severity };

export function finding(severity: Severity, code: string, message: string, refs: readonly string[] = [], fields?: readonly string[]): Finding {
  return fields && fields.length > 0 ? { severity, code, message, refs: [...refs], fields: [...fields] } : { severity, code, message, refs: [...refs] };
}

/** Collects findings; one collector per calculation (no module state). */
export class Findings {
  readonly list: Finding[] = [];
  private seen = new Set<string>();
  /** `fields`: the design conditions the finding is about ("design.safetyValveBar"), so the board can link to them. */
  add(severity: Severity, code: string, message: string, refs: readonly string[] = [], fields?: readonly string[]): void {
    const key = `${code}|${refs.join(",")}|${message}`;
    if (this.seen.has(key)) return;
    this.seen.add(key);
    this.list.push(finding(severity, code, message, refs, fields));
  }
  error(code: string, message: string, refs: readonly string[] = [], fields?: readonly string[]) {
    this.add("error", code, message, refs, fields);
  }
  warning(code: string, message: string, refs: readonly string[] = [], fields?: readonly string[]) {
    this.add("warning", code, message, refs, fields);
  }
  info(code: string, message: string, refs: readonly string[] = [], fields?: readonly string[]) {
    this.add("info", code, message, refs, fields);
  }
}
