import { describe, expect, it } from "vitest";
import { safeNext } from "./schemas";

// Where sign-in and sign-out may send the browser (issue 17 item 5): paths on this app only.
describe("safeNext", () => {
  it.each(["/\t/evil.example/x", "/\n/x", "/\r\n/x", "//evil.example", "/\\evil.example", "\\\\evil.example", "https://evil.example",
    "javascript:alert(1)", "", "projects", "/\u007f/x"])("refuses %j", (next) => {
    expect(safeNext(next)).toBe("/projects");
  });

  it("keeps this app's paths, with their query and fragment", () => {
    expect(safeNext("/projects/abc?tab=team#members")).toBe("/projects/abc?tab=team#members");
    expect(safeNext("/invite/tok_en")).toBe("/invite/tok_en");
    expect(safeNext(null, "/")).toBe("/");
  });
});
