/**
 * Keyboard shortcuts: registry commands carry their own keys; view actions
 * (fit, help) are listed here. The help overlay reads both, so it can never
 * disagree with what the keys do.
 */
import { commands, type CommandId } from "./commands";

export type ViewAction = "fit-view" | "help" | "clear-selection";
export const viewKeys: { action: ViewAction; label: string; keys: string[] }[] = [
  { action: "fit-view", label: "Fit to view", keys: ["F"] },
  { action: "help", label: "Show these shortcuts", keys: ["?"] },
  { action: "clear-selection", label: "Clear selection / close", keys: ["Escape"] },
];
export const pointerHelp: { label: string; keys: string[] }[] = [
  { label: "Pipe two ports", keys: ["drag port → port"] },
  { label: "Add to selection / box select", keys: ["Shift+click", "Shift+drag"] },
  { label: "Pan / zoom", keys: ["drag background", "wheel"] },
];

/** "Mod+Shift+Z" → does this keydown match? Mod = Ctrl or ⌘. */
export function matches(combo: string, e: Pick<KeyboardEvent, "key" | "ctrlKey" | "metaKey" | "shiftKey" | "altKey">): boolean {
  const parts = combo.split("+");
  const key = parts.pop()!;
  const mod = parts.includes("Mod");
  const shift = parts.includes("Shift");
  if (mod !== (e.ctrlKey || e.metaKey) || e.altKey) return false;
  if (key === "?") return e.key === "?";
  if (shift !== e.shiftKey) return false;
  return e.key.toLowerCase() === key.toLowerCase();
}

export function keyTarget(e: KeyboardEvent): { command: CommandId } | { view: ViewAction } | null {
  for (const [id, cmd] of Object.entries(commands) as [CommandId, { keys?: string[] }][]) {
    if (cmd.keys?.some((k) => matches(k, e))) return { command: id };
  }
  for (const v of viewKeys) if (v.keys.some((k) => matches(k, e))) return { view: v.action };
  return null;
}
