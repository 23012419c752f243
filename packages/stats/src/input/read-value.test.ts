import { describe, expect, it } from "vitest";
import { readValue } from "./read-value.js";

const problem = (cell: string) => {
  const r = readValue(cell);
  return r.kind === "refused" ? r.problem : r.kind;
};

describe("readValue: the one reader of data values (rules in its header comment)", () => {
  it("keeps plain decimal text exactly as written, trimmed", () => {
    expect(readValue(" 4.50 ")).toEqual({ kind: "number", text: "4.50" });
    for (const t of ["12", "-4.5", "+7", ".5", "1.2e-3", "2E4", "0", "123456789012345678901"])
      expect(readValue(t).kind).toBe("number");
  });

  it("drops the missing-value tokens without regard to case", () => {
    for (const t of ["", "  ", "NA", "na", "N/A", "NaN", "null", "NULL", ".", "-", "\u00a0"])
      expect(readValue(t).kind).toBe("missing");
  });

  it("refuses what it will not guess at, naming the cause", () => {
    expect(problem("4,5")).toBe("decimal-comma");
    expect(problem("1.234,5")).toBe("decimal-comma");
    expect(problem("1,234.5")).toBe("thousands-separator");
    expect(problem("1,234")).toBe("thousands-separator");
    expect(problem("\u0663\u066b\u0665")).toBe("other-digits"); // Arabic-Indic 3٫5
    expect(problem("\uff14\uff15")).toBe("other-digits"); // full-width 45
    expect(problem("\u22124.2")).toBe("typographic-minus"); // U+2212 MINUS SIGN
    expect(problem("\u20134.2")).toBe("typographic-minus"); // en dash
    expect(problem("12 kg")).toBe("unit");
    expect(problem("45%")).toBe("unit");
    expect(problem("$12")).toBe("unit");
    expect(problem("0x1F")).toBe("hex");
    expect(problem("abc")).toBe("not-a-number");
    const r = readValue("1,234.5");
    expect(r.kind === "refused" && r.message).toMatch(/thousands separator.*1234\.5/);
  });

  it("refuses values a double cannot hold: 1e309, a 400-digit integer, Infinity, 1e-400", () => {
    expect(problem("1e309")).toBe("too-large");
    expect(problem("9".repeat(400))).toBe("too-large");
    expect(problem("-Infinity")).toBe("infinite");
    expect(problem("1e-400")).toBe("too-small");
    expect(problem("0e-400")).toBe("number");
  });

  it("refuses a 1 MB cell in one pass, without reading it as a number (outcome asserted, not time)", () => {
    const cell = "North," + "1".repeat(1_000_000) + "x";
    const r = readValue(cell);
    expect(r.kind === "refused" && r.problem).toBe("too-long");
    expect(r.kind === "refused" && r.message.length).toBeLessThan(200);
    // 400 characters of the backtracking pattern's worst case still go through the full diagnosis.
    expect(problem("1".repeat(390) + "x")).toBe("unit");
  });
});
