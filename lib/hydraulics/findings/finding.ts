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

/** What a finding was found in: a design mode, or a simulated scenario (with its mode). */
export type FindingContext = Pick<Finding, "mode" | "scenario">;

/**
 * Collects findings; one collector per calculation (no module state). While
 * `within` runs, every finding added is tagged with that mode or scenario, so
 * the board can show the drawing in the state a finding belongs to.
 */
export class Findings {
  readonly list: Finding[] = [];
  private seen = new Set<string>();
  private context: FindingContext = {};
  within<T>(context: FindingContext, fn: () => T): T {
    const outer = this.context;
    this.context = context;
    try {
      return fn();
    } finally {
      this.context = outer;
    }
  }
  /** `fields`: the design conditions the finding is about ("design.safetyValveBar"), so the board can link to them. */
  add(severity: Severity, code: string, message: string, refs: readonly string[] = [], fields?: readonly string[]): void {
    const { mode, scenario } = this.context;
    const key = `${code}|${refs.join(",")}|${message}|${mode ?? ""}|${scenario ?? ""}`;
    if (this.seen.has(key)) return;
    this.seen.add(key);
    const f = finding(severity, code, message, refs, fields);
    if (mode) f.mode = mode;
    if (scenario !== undefined) f.scenario = scenario;
    this.list.push(f);
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
