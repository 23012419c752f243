import { describe, expect, it } from "vitest";
import { formatDf, formatP, formatPWithExponent, formatStat, formatUnit } from "./format.js";

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

  it("writes small p with its power of ten and never as 0 (scientific notation: common practice)", () => {
    expect(formatPWithExponent(0.0254)).toBe("= .025");
    expect(formatPWithExponent(3.24e-8)).toBe("= 3.2 × 10^\u22128");
    expect(formatPWithExponent(1e-300)).toBe("= 1.0 × 10^\u2212300");
    // log10 p = −716.3 → p = 10^0.7 × 10^−717 ≈ 5.01 × 10^−717.
    expect(formatPWithExponent(0, -716.3)).toBe("≈ 5 × 10^\u2212717");
    expect(formatPWithExponent(0, -716)).toBe("≈ 10^\u2212716");
    expect(formatPWithExponent(0, -716.0001)).toBe("≈ 10^\u2212716");
    expect(formatPWithExponent(0)).toBe("< 1e-300");
    expect(formatPWithExponent(Number.NaN)).toBe("not available");
  });
});
