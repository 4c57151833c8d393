"use client";

import { useUnits } from "@/components/units/units-context";
import { Button } from "@/components/ui/button";
import { showPressure } from "@/lib/units/display";
import { useBoardApi } from "../board-api";
import { useBoard } from "../store";
import { useProposal } from "./proposal-store";

const tone = { error: "text-fault", warning: "text-warn", info: "text-ink-soft" } as const;
const money = (x: number) => x.toLocaleString("en-GB", { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/** The last proposal: cost and pump heads before → after, the pipes that change, apply in one undoable step. */
export function ProposalResult() {
  const result = useProposal((s) => s.result);
  const proposedAt = useProposal((s) => s.revision);
  const status = useProposal((s) => s.status);
  const error = useProposal((s) => s.error);
  const locked = useProposal((s) => s.options.locked);
  const setOptions = useProposal((s) => s.setOptions);
  const run = useProposal((s) => s.run);
  const revision = useBoard((s) => s.revision);
  const readOnly = useBoard((s) => s.readOnly);
  const rho = useBoard((s) => s.results?.fluid.densityKgM3 ?? null);
  const dispatch = useBoard((s) => s.dispatch);
  const api = useBoardApi();
  const { prefs } = useUnits();
  if (status === "error") return <p role="alert" className="text-sm text-fault">{error}</p>;
  if (!result) return null;
  const stale = proposedAt !== revision;
  const kPa = (x: number | null | undefined) => showPressure(x, prefs, rho).text;
  const demo = Object.values(result.priceSource).includes("default-demo");
  const errors = result.findings.filter((f) => f.severity !== "info");
  const toggle = (id: string) => setOptions({ locked: locked.includes(id) ? locked.filter((x) => x !== id) : [...locked, id] });
  const keeping = result.changes.filter((c) => locked.includes(c.id)).length;
  const dCost = result.after.cost - result.before.cost;
  return (
    <div className="space-y-3 text-sm" data-testid="proposal-result">
      {stale && <p role="status" className="rounded bg-warn/10 px-2 py-1 text-xs text-warn">The drawing changed since this proposal — find sizes again.</p>}
      {!result.feasible ? (
        <p className="rounded bg-fault/10 px-2 py-1 text-fault" data-testid="proposal-infeasible">No sizes meet every limit — nothing to apply.</p>
      ) : (
        <p className="text-ink">
          <span className="font-medium">{result.changes.length === 0 ? "The drawn sizes are already the best." : `${result.changes.length} pipe${result.changes.length > 1 ? "s" : ""} change.`}</span>{" "}
          <span className="text-xs text-ink-soft">{result.exact ? "Proven cheapest for these limits." : result.gap !== null ? `Within ${(result.gap * 100).toFixed(1)} % of the lower bound${result.looped ? " (at the proposal's flows)" : ""}.` : "Best found; no bound."}</span>
        </p>
      )}
      <table className="w-full text-left text-xs">
        <thead className="text-xs text-ink-soft"><tr><th className="font-normal" /><th className="font-normal">Drawn</th><th className="font-normal">Proposed</th></tr></thead>
        <tbody className="num [&_td]:whitespace-nowrap [&_td]:pr-2">
          <tr><th className="font-normal text-ink-soft">Pipe cost</th><td>{money(result.before.cost)}</td>
            <td className={dCost < 0 ? "text-ok" : ""}>{money(result.after.cost)}{dCost !== 0 && <span className="ml-1 text-xs">({dCost > 0 ? "+" : ""}{money(dCost)})</span>}</td></tr>
          {result.objective === "life-cost" && (
            <tr><th className="font-normal text-ink-soft">Pipes + energy</th><td>{money(result.before.lifeCost ?? 0)}</td><td>{money(result.after.lifeCost ?? 0)}</td></tr>
          )}
          {result.before.pumps.map((p) => (
            <tr key={`${p.id}-${p.mode}`}>
              <th className="font-normal text-ink-soft">Head {p.id} <span className="text-xs">({p.mode})</span></th>
              <td>{kPa(p.requiredHeadKpa)}</td>
              <td>{kPa(result.after.pumps.find((a) => a.id === p.id && a.mode === p.mode)?.requiredHeadKpa)} <span className="text-xs text-ink-faint">of {kPa(p.limitKpa)}</span></td>
            </tr>
          ))}
        </tbody>
      </table>
      {result.changes.length > 0 && (
        <div className="max-h-56 overflow-auto rounded border border-ink/10">
          <table className="w-full text-left text-xs" data-testid="proposal-changes">
            <thead className="sticky top-0 bg-white text-xs text-ink-soft"><tr><th className="px-2 font-normal">Pipe</th><th className="font-normal">Length</th><th className="font-normal">Size</th><th className="px-2 text-right font-normal">Keep</th></tr></thead>
            <tbody>
              {result.changes.map((c) => (
                <tr key={c.id} className="border-t border-ink/5">
                  <td className="px-2"><button type="button" className="underline decoration-dotted underline-offset-2 hover:text-copper-700" onClick={() => api.selectRefs([c.id])}>{c.id}</button></td>
                  <td className="num">{c.lengthM} m</td>
                  <td className="num">{c.from} → <span className="font-medium">{c.to}</span></td>
                  <td className="px-2 text-right"><input type="checkbox" aria-label={`Keep ${c.id} at ${c.from}`} checked={locked.includes(c.id)} onChange={() => toggle(c.id)} /></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {errors.length > 0 && (
        <ul className="space-y-1">
          {errors.map((f, i) => (
            <li key={i}><button type="button" className="text-left" onClick={() => api.selectRefs(f.refs)}>
              <span className={`mr-1 text-xs font-semibold uppercase ${tone[f.severity]}`}>{f.severity}</span>{f.message}
            </button></li>
          ))}
        </ul>
      )}
      <div className="flex flex-wrap gap-2">
        {keeping > 0 && <Button variant="secondary" className="px-2 py-1 text-xs" onClick={() => void run()}>Find again, keeping {keeping}</Button>}
        {result.feasible && result.changes.length > 0 && !readOnly && (
          <Button className="px-2 py-1 text-xs" disabled={stale} data-testid="apply-proposal"
            onClick={() => dispatch("apply-size-proposal", { sizes: result.sizes })}>
            Apply proposal ({result.changes.length} pipes, one undo step)
          </Button>
        )}
      </div>
      <p className="text-xs text-ink-faint">
        Limits: {"velocity ≤ design maximum in every mode; every circuit within its pump's head at design flow"}
        {result.headMarginKpa > 0 ? ` less ${result.headMarginKpa} kPa` : " (margin 0 kPa)"}. Pipes without design flow, locked or with a given bore keep their size.
        {demo && " Prices: invented demo table until the firm's price list is entered."} Check the result with Size it; a competent person signs off the design.
      </p>
    </div>
  );
}
