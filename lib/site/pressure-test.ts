/**
 * Pass or fail of a pressure test against the firm's rule: the test held at least the
 * firm's hold time, the pressure fell by no more than the firm's allowed drop, and it
 * started at (or above) the test pressure. The rule is the firm's (organisations.site_rules)
 * with its basis shown beside every verdict; the default below is common practice, not a
 * standard's clause (values recalled, not taken from a standard we hold): a firm that
 * works to a standard enters its numbers and cites the standard and clause as the basis.
 */
import { z } from "zod";
import type { PressureTestData } from "./events";

export const pressureTestRuleSchema = z.object({
  maxDropBar: z.number().min(0).max(5),
  holdMinutes: z.number().int().min(1).max(24 * 60),
  basis: z.string().trim().min(3, "say where the rule comes from (a standard and clause, or common practice)").max(200),
});
export type PressureTestRule = z.output<typeof pressureTestRuleSchema>;

export const DEFAULT_PRESSURE_TEST_RULE: PressureTestRule = {
  maxDropBar: 0.2,
  holdMinutes: 60,
  basis: "common practice (no standard's clause: set your firm's own rule and cite it)",
};

/** Past this ambient change the reading moves with temperature alone (common practice). */
export const AMBIENT_CHANGE_NOTE_K = 5;

export interface PressureTestVerdict {
  pass: boolean;
  dropBar: number;
  heldMinutes: number;
  reasons: string[];
  notes: string[];
  rule: PressureTestRule;
}

export function evaluatePressureTest(d: PressureTestData, rule: PressureTestRule): PressureTestVerdict {
  const dropBar = d.startPressureBar - d.endPressureBar;
  const heldMinutes = (Date.parse(d.endedAt) - Date.parse(d.startedAt)) / 60_000;
  const reasons: string[] = [];
  if (d.startPressureBar < d.testPressureBar) reasons.push(`started at ${d.startPressureBar} bar, below the test pressure ${d.testPressureBar} bar`);
  if (heldMinutes < rule.holdMinutes) reasons.push(`held ${heldMinutes.toFixed(0)} min; the rule asks for ${rule.holdMinutes} min`);
  if (dropBar > rule.maxDropBar + 1e-9) reasons.push(`fell ${dropBar.toFixed(2)} bar; the rule allows ${rule.maxDropBar} bar`);
  const notes: string[] = [];
  const dT = Math.abs(d.ambientEndC - d.ambientStartC);
  if (dT > AMBIENT_CHANGE_NOTE_K) notes.push(`ambient changed ${dT.toFixed(1)} K: pressure moves with temperature, so repeat the test if in doubt`);
  if (d.medium !== "water") notes.push("a test with air or gas stores far more energy than one with water: low pressure only, people kept clear");
  return { pass: reasons.length === 0, dropBar, heldMinutes, reasons, notes, rule };
}

/** Parts on this drawing to isolate (or remove and plug) before a test at this pressure. */
export function isolateBeforeTest(parts: { id: string; type: string; label: string; setBar?: number }[], testPressureBar: number | null): string[] {
  const out: string[] = [];
  for (const p of parts) {
    if (p.type === "safety-valve" && p.setBar !== undefined && testPressureBar !== null && testPressureBar >= p.setBar)
      out.push(`${p.label}: set at ${p.setBar} bar, it would lift — isolate it or take it off and plug the connection`);
    else if (["expansion-vessel", "heat-pump", "boiler", "cylinder", "pressure-gauge"].includes(p.type))
      out.push(`${p.label}: isolate unless its rating covers the test pressure`);
  }
  return out;
}

export const PRESSURE_TEST_CAUTION =
  "Test with the system isolated from every part not rated for the test pressure. Release the pressure before breaking a joint; keep people clear while it is under pressure. Follow local codes and your firm's procedure.";
