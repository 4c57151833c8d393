/** Per scenario both designs share: the heat source's flow and the heat the emitters deliver, A, B and B − A. */
import { difference } from "@/lib/compare/rows";
import type { SharedScenario } from "@/lib/compare/scenarios";
import type { UnitPrefs } from "@/lib/units/display";
import { formatDiff, formatValue } from "./format";
import { cellClass, CompareHead, rowClass } from "./metrics-table";


export function ScenarioTable({ scenarios, prefs }: { scenarios: SharedScenario[]; prefs: UnitPrefs }) {
  if (scenarios.length === 0) return <p className="text-sm text-ink-soft">The two designs share no simulated scenario.</p>;
  const lines = scenarios.flatMap((s) => [
    { key: `${s.name}/flow`, label: `${s.name}: heat-source flow`, q: "flow" as const, a: s.a.heatSourceFlowM3h, b: s.b.heatSourceFlowM3h, s },
    { key: `${s.name}/heat`, label: `${s.name}: heat delivered`, q: "power" as const, a: s.a.heatDeliveredW, b: s.b.heatDeliveredW, s },
  ]);
  const unconverged = (ok: boolean) => (ok ? null : <span className="block text-[11px] text-warn">did not converge</span>);
  return (
    <table className="w-full text-sm md:table-fixed" data-testid="compare-scenarios">
      <caption className="sr-only">Simulated scenarios both designs share</caption>
      <CompareHead first="Scenario" />
      <tbody>
        {lines.map((l) => (
          <tr key={l.key} className={rowClass} data-scenario={l.key}>
            <th scope="row" className={`col-span-3 text-left font-medium text-ink md:font-normal ${cellClass}`}>{l.label}</th>
            <td className={cellClass}><span className="num">{formatValue(l.q, l.a, prefs, null)}</span>{unconverged(l.s.a.converged)}</td>
            <td className={cellClass}><span className="num">{formatValue(l.q, l.b, prefs, null)}</span>{unconverged(l.s.b.converged)}</td>
            <td className={`${cellClass} num text-ink-soft`}>{formatDiff(l.q, difference(l.a, l.b), prefs, null)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
