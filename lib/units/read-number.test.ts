import { describe, expect, it } from "vitest";
import { readNumber, separatorsOf } from "./read-number";

const value = (t: string, l?: string) => {
  const r = readNumber(t, l);
  return r.ok ? r.value : r.message;
};

describe("numbers as people type them", () => {
  it("reads the locale's separators from Intl (en-GB: . and ,; de-DE: , and .)", () => {
    expect(separatorsOf("en-GB")).toEqual({ decimal: ".", group: "," });
    expect(separatorsOf("de-DE")).toEqual({ decimal: ",", group: "." });
  });

  it("en-GB: “1,500” is fifteen hundred, never 1.5", () => {
    expect(value("1,500", "en-GB")).toBe(1500);
    expect(value("12,500.5", "en-GB")).toBe(12500.5);
    expect(value("1 500", "en-GB")).toBe(1500);
    expect(value(" 2.25 ", "en-GB")).toBe(2.25);
    expect(value("-3", "en-GB")).toBe(-3);
    expect(value(".5", "en-GB")).toBe(0.5);
    expect(value("1e3", "en-GB")).toBe(1000);
  });

  it("en-GB: what cannot be read one way is refused with a message saying how to write it", () => {
    for (const t of ["1,5", "1,50", "0,5", "1.500,5", "1,5000", ",5"]) {
      const r = readNumber(t, "en-GB");
      expect(r.ok, t).toBe(false);
      if (!r.ok) expect(r.message).toMatch(/two ways|not a number/);
    }
    expect(readNumber("1.2.3", "en-GB").ok).toBe(false);
    expect(readNumber("abc", "en-GB").ok).toBe(false);
    expect(readNumber("", "en-GB").ok).toBe(false);
    expect(readNumber("1e999", "en-GB").ok).toBe(false);
  });

  it("de-DE reads the other way round: “1.500” is 1500, “1,5” is 1.5, “1.5” is refused", () => {
    expect(value("1.500", "de-DE")).toBe(1500);
    expect(value("1,5", "de-DE")).toBe(1.5);
    expect(value("1.500,25", "de-DE")).toBe(1500.25);
    expect(readNumber("1.5", "de-DE").ok).toBe(false);
  });
});
