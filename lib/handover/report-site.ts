/**
 * The site part of the handover report: the settings to make on each part (the site
 * sheet's own, lib/site/settings.ts) and the records made on site against this revision
 * (lib/site/records.ts) — pressure tests with the firm's rule as it stood, fill and
 * commissioning records with their checks against the design. A record later corrected
 * is listed, marked so, beside the record that corrects it.
 */
import type { Results, Schematic } from "@/lib/schematic";
import { balancingTargets } from "@/lib/site/balancing";
import { partName } from "@/lib/site/names";
import type { ReadingCheck } from "@/lib/site/commissioning";
import type { SiteRecords } from "@/lib/site/records";
import { partSettings } from "@/lib/site/settings";
import type { Block, Section } from "./report-blocks";

const when = (iso: string) => iso.replace("T", " ").slice(0, 16);
const by = (r: { author: { name: string | null }; madeAt: string; correctedBy: string | null }) =>
  `${when(r.madeAt)}, ${r.author.name ?? "—"}${r.correctedBy ? " (corrected by a later record)" : ""}`;

export function settingsSection(doc: Schematic, results: Results | null): Section {
  const balancing = results ? balancingTargets(doc, results) : undefined;
  const rows = doc.parts.flatMap((p) => partSettings(p, doc, results, balancing)
    .filter((s) => s.key !== "as-drawn")
    .map((s) => [partName(p), s.label, s.value, [s.detail, s.warn ? `ATTENTION: ${s.warn}` : ""].filter(Boolean).join(" — ")]));
  return { id: "settings", title: "Settings to make on site", blocks: rows.length
    ? [{ kind: "table", columns: ["Part", "Setting", "Value", "Notes"], rows }]
    : [{ kind: "para", text: "No settings to make." }] };
}

const checkRows = (checks: ReadingCheck[]) => checks.map((c) => [c.label, c.measured, c.design, c.deviation || "—", c.tolerance,
  c.ok === null ? "no design value" : c.ok ? "within" : "OUTSIDE"]);
const checkColumns = ["Reading", "Measured", "Design", "Deviation", "Tolerance", "Result"];

export function recordSections(records: SiteRecords): Section[] {
  const pressure: Block[] = records.pressureTests.length
    ? [{ kind: "table", columns: ["Made", "Medium", "Test bar", "Start bar", "End bar", "Drop bar", "Held min", "Witness", "Result"],
        rows: records.pressureTests.map((t) => [by(t), t.data.medium, String(t.data.testPressureBar), String(t.data.startPressureBar), String(t.data.endPressureBar),
          t.verdict.dropBar.toFixed(2), t.verdict.heldMinutes.toFixed(0), t.data.witness,
          t.verdict.pass ? "PASS" : `FAIL: ${t.verdict.reasons.join("; ")}`]) },
      { kind: "para", tone: "muted", text: `Judged against the firm's rule as it stood when each test was recorded (${
        records.pressureTests.map((t) => `at most ${t.verdict.rule.maxDropBar} bar drop over ${t.verdict.rule.holdMinutes} min`).filter((v, i, a) => a.indexOf(v) === i).join("; ")}).` }]
    : [{ kind: "para", tone: "warn", text: "No pressure test has been recorded against this revision." }];
  const fills: Block[] = records.fills.length
    ? records.fills.flatMap((r): Block[] => [
        { kind: "para", text: `${r.data.stage[0]!.toUpperCase()}${r.data.stage.slice(1)} — ${by(r)}${r.data.product ? `; product ${r.data.product}` : ""}${r.data.volumeL !== undefined ? `; ${r.data.volumeL} L` : ""}${r.data.notes ? `; ${r.data.notes}` : ""}` },
        ...(r.checks.length ? [{ kind: "table" as const, columns: checkColumns, rows: checkRows(r.checks) }] : []),
      ])
    : [{ kind: "para", tone: "warn", text: "No flush, fill or inhibitor record against this revision." }];
  const commissioning: Block[] = records.commissioning.length
    ? records.commissioning.flatMap((r): Block[] => [
        { kind: "para", text: `Readings — ${by(r)}${r.data.notes ? `; ${r.data.notes}` : ""}` },
        { kind: "table", columns: checkColumns, rows: checkRows(r.checks) },
      ])
    : [{ kind: "para", tone: "warn", text: "No commissioning readings recorded against this revision." }];
  return [
    { id: "pressure-tests", title: "Pressure tests", blocks: pressure },
    { id: "fill", title: "Flush, fill and inhibitor", blocks: fills },
    { id: "commissioning", title: "Commissioning", blocks: commissioning },
  ];
}
