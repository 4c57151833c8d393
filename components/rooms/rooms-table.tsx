"use client";
/**
 * The rooms as an editable grid. Keyboard: Tab / Shift+Tab across, ↑ ↓ (and
 * Enter / Shift+Enter) to the same column in the row above or below, Enter on
 * the last row adds a room, Esc puts the cell back as it was, Ctrl+S saves.
 * Problems show in the cell (same schema as the server) and nothing is saved
 * while there are any.
 */
import { useRef, type KeyboardEvent } from "react";
import { columns, type ColumnKey, type RoomRow } from "./room-rows";

const inputClass = "w-full rounded border bg-white px-1.5 py-1 text-sm focus:outline-2 focus:outline-copper-500";

export function RoomsTable({ rows, problems, editable, onChange, onAdd, onRemove, onSave }: {
  rows: RoomRow[]; problems: Map<string, string>; editable: boolean;
  onChange: (index: number, key: ColumnKey, value: string) => void; onAdd: () => void; onRemove: (index: number) => void; onSave: () => void;
}) {
  const grid = useRef<HTMLTableElement>(null);
  const before = useRef<string>("");
  const focusCell = (r: number, c: number) => {
    requestAnimationFrame(() => grid.current?.querySelector<HTMLElement>(`[data-cell="${r}:${c}"]`)?.focus());
  };
  const onKey = (e: KeyboardEvent<HTMLElement>, r: number, c: number) => {
    if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === "s") {
      e.preventDefault();
      return onSave();
    }
    const select = e.currentTarget.tagName === "SELECT";
    const down = e.key === "Enter" ? !e.shiftKey : e.key === "ArrowDown" && !select;
    const up = e.key === "Enter" ? e.shiftKey : e.key === "ArrowUp" && !select;
    if (e.key === "Escape") {
      e.preventDefault();
      onChange(r, columns[c]!.key, before.current);
    } else if (down) {
      e.preventDefault();
      if (r === rows.length - 1 && e.key === "Enter" && editable) onAdd();
      focusCell(Math.min(r + 1, e.key === "Enter" ? rows.length : rows.length - 1), c);
    } else if (up) {
      e.preventDefault();
      focusCell(Math.max(0, r - 1), c);
    }
  };

  return (
    <div className="relative overflow-x-auto rounded-md border border-ink/10 bg-white">
      <table ref={grid} className="min-w-max border-collapse text-sm" data-testid="rooms-table" aria-label="Rooms">
        <thead className="bg-paper-dark text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-2 py-2 font-medium">#</th>
            {columns.map((c) => <th key={c.key} scope="col" className="px-2 py-2 font-medium whitespace-nowrap">{c.label}</th>)}
            {editable && <th scope="col" className="px-2 py-2"><span className="sr-only">Remove</span></th>}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, r) => (
            <tr key={row.key} className="border-t border-ink/5 align-top">
              <td className="num px-2 py-1.5 text-xs text-ink-faint">{r + 1}</td>
              {columns.map((col, c) => {
                const problem = problems.get(`${r}:${col.key}`);
                const label = `${row.name || `Room ${r + 1}`} — ${col.label}`;
                const common = {
                  "data-cell": `${r}:${c}`, "aria-label": label, "aria-invalid": problem ? true : undefined, disabled: !editable,
                  onFocus: () => { before.current = row[col.key]; }, onKeyDown: (e: KeyboardEvent<HTMLElement>) => onKey(e, r, c),
                  className: `${inputClass} ${problem ? "border-fault" : "border-ink/15"}`,
                };
                const off = (col.key === "outputAtDt50W" || col.key === "exponentN") ? row.kind !== "radiator" : col.key === "emitterFloorAreaM2" ? row.kind !== "ufh-loop" : false;
                return (
                  <td key={col.key} className={`px-1 py-1 ${col.width}`}>
                    {col.key === "kind" ? (
                      <select {...common} value={row.kind} onChange={(e) => onChange(r, "kind", e.target.value)}>
                        <option value="radiator">radiator</option>
                        <option value="ufh-loop">underfloor</option>
                        <option value="">none yet</option>
                      </select>
                    ) : (
                      <input {...common} value={off ? "" : row[col.key]} disabled={!editable || off} placeholder={off ? "—" : undefined}
                        inputMode={col.key === "name" ? "text" : "decimal"} onChange={(e) => onChange(r, col.key, e.target.value)} />
                    )}
                    {problem && <p className="mt-0.5 max-w-40 text-xs text-fault" role="alert">{problem}</p>}
                  </td>
                );
              })}
              {editable && (
                <td className="px-1 py-1">
                  <button type="button" onClick={() => onRemove(r)} className="rounded px-2 py-1 text-xs text-ink-faint hover:bg-paper-dark hover:text-fault"
                    aria-label={`Remove ${row.name || `room ${r + 1}`}`}>✕</button>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
