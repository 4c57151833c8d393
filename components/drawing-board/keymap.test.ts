import { describe, expect, it } from "vitest";
import { keyTarget } from "./keymap";

const key = (key: string, mods: Partial<Record<"ctrlKey" | "metaKey" | "shiftKey" | "altKey", boolean>> = {}) =>
  ({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods }) as KeyboardEvent;

describe("keymap", () => {
  it("maps the editing shortcuts to registry commands", () => {
    expect(keyTarget(key("z", { ctrlKey: true }))).toEqual({ command: "undo" });
    expect(keyTarget(key("Z", { ctrlKey: true, shiftKey: true }))).toEqual({ command: "redo" });
    expect(keyTarget(key("y", { metaKey: true }))).toEqual({ command: "redo" });
    expect(keyTarget(key("Delete"))).toEqual({ command: "delete-selection" });
    expect(keyTarget(key("d", { ctrlKey: true }))).toEqual({ command: "duplicate-selection" });
    expect(keyTarget(key("t"))).toEqual({ command: "tidy-selection" });
    expect(keyTarget(key("f"))).toEqual({ view: "fit-view" });
    expect(keyTarget(key("?", { shiftKey: true }))).toEqual({ view: "help" });
    expect(keyTarget(key("t", { ctrlKey: true }))).toBeNull();
  });
});
