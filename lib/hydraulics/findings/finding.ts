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

const rank: Record<Severity, number> = { info: 0, warning: 1, error: 2 };

/**
 * Collects findings; one collector per calculation (no module state). While `within` runs,
 * a new finding is tagged with that mode or scenario, so the board can show the drawing in
 * the state it belongs to. One finding per code and set of refs: a check that trips again for
 * the same parts — in another mode or scenario — adds its message to the first finding (and
 * raises its severity if higher) instead of repeating it, so a designer reads one fault once;
 * found in more than one state, it loses its tag and shows in every view.
 */
export class Findings {
  readonly list: Finding[] = [];
  private byKey = new Map<string, { finding: Finding; messages: Set<string> }>();
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
    const key = `${code}|${[...refs].sort().join(",")}`;
    const first = this.byKey.get(key);
    if (!first) {
      const { mode, scenario } = this.context;
      const f = finding(severity, code, message, refs, fields);
      if (mode) f.mode = mode;
      if (scenario !== undefined) f.scenario = scenario;
      this.byKey.set(key, { finding: f, messages: new Set([message]) });
      this.list.push(f);
      return;
    }
    const f = first.finding;
    const { mode, scenario } = this.context;
    if (f.mode !== mode || f.scenario !== scenario) {
      delete f.mode;
      delete f.scenario;
    }
    if (!first.messages.has(message)) {
      first.messages.add(message);
      f.message = `${f.message}; ${message}`;
    }
    if (rank[severity] > rank[f.severity]) f.severity = severity;
    const more = (fields ?? []).filter((x) => !(f.fields ?? []).includes(x));
    if (more.length > 0) f.fields = [...(f.fields ?? []), ...more];
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
