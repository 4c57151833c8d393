"use client";
import { commands } from "./commands";
import { pointerHelp, viewKeys } from "./keymap";

const rows = [
  ...Object.values(commands).flatMap((c) => ("keys" in c && c.keys ? [{ label: c.label, keys: c.keys as readonly string[] }] : [])),
  ...viewKeys,
  ...pointerHelp,
];

const Kbd = ({ k }: { k: string }) => (
  <kbd className="rounded border border-ink/20 bg-paper px-1.5 py-0.5 font-mono text-[11px] text-ink">{k.replace("Mod", "Ctrl/⌘")}</kbd>
);

/** Every shortcut, read from the command registry and keymap. */
export function HelpOverlay({ onClose }: { onClose: () => void }) {
  return (
    <div className="absolute inset-0 z-30 flex items-center justify-center bg-ink/20" onClick={onClose} role="dialog" aria-label="Keyboard shortcuts">
      <div className="max-h-[80%] w-[26rem] overflow-auto rounded-lg border border-ink/10 bg-white p-4 shadow-lg" onClick={(e) => e.stopPropagation()}>
        <div className="mb-2 flex items-center justify-between">
          <h2 className="font-semibold">Shortcuts</h2>
          <button className="text-sm text-ink-soft hover:text-ink" onClick={onClose}>Close</button>
        </div>
        <table className="w-full text-sm">
          <tbody>
            {rows.map((r) => (
              <tr key={r.label} className="border-t border-ink/5">
                <td className="py-1 pr-3 text-ink-soft">{r.label}</td>
                <td className="py-1 text-right">
                  <span className="inline-flex flex-wrap justify-end gap-1">{r.keys.map((k) => <Kbd key={k} k={k} />)}</span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
