import { describe, expect, it } from "vitest";
import { formatDf, formatP, formatStat, formatUnit } from "./format.js";

// Expected strings follow APA 7th ed. numeric style (common practice in reporting).
describe("reporting format", () => {
  it("prints p without a leading zero, exact to three decimals, and < .001 below", () => {
    expect(formatP(0.0254)).toBe("= .025");
    expect(formatP(0.0004)).toBe("< .001");
    expect(formatP(0.001)).toBe("= .001");
    expect(formatP(0.9999)).toBe("> .999");
    expect(formatP(Number.NaN)).toBe("not available");
  });

  it("uses a true minus sign and never prints negative zero", () => {
    expect(formatStat(-1.234)).toBe("\u22121.23");
    expect(formatStat(-0.001)).toBe("0.00");
    expect(formatUnit(-0.172)).toBe("\u2212.17");
  });

  it("keeps integer df and gives Welch's fractional df one decimal", () => {
    expect(formatDf(27)).toBe("27");
    expect(formatDf(14.637)).toBe("14.6");
  });
});
