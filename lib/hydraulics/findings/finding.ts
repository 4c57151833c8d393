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

const rank: Record<Severity, number> = { info: 0, warning: 1, error: 2 };

/**
 * Collects findings; one collector per calculation (no module state). One finding per code and
 * set of refs: a check that trips again for the same parts — in another mode, or in another
 * situation (design flow and every zone shut) — adds its message to the first finding (and raises
 * its severity if higher) instead of repeating it, so a designer reads one fault once.
 */
export class Findings {
  readonly list: Finding[] = [];
  private byKey = new Map<string, { finding: Finding; messages: Set<string> }>();
  add(severity: Severity, code: string, message: string, refs: readonly string[] = []): void {
    const key = `${code}|${[...refs].sort().join(",")}`;
    const first = this.byKey.get(key);
    if (!first) {
      const f = finding(severity, code, message, refs);
      this.byKey.set(key, { finding: f, messages: new Set([message]) });
      this.list.push(f);
      return;
    }
    if (!first.messages.has(message)) {
      first.messages.add(message);
      first.finding.message = `${first.finding.message}; ${message}`;
    }
    if (rank[severity] > rank[first.finding.severity]) first.finding.severity = severity;
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
