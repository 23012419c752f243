import { describe, expect, it } from "vitest";
import { formatAlpha, formatBounded, formatBytes, formatDf, formatP, formatStat } from "./format";

// Expected strings follow APA 7th edition reporting style (common practice): exact p to three
// decimals without a leading zero, "p < .001" below, statistics to two decimals.
describe("formatP", () => {
  it.each([
    [0.025, "= .025"],
    [0.0251, "= .025"],
    [0.05, "= .050"],
    [0.001, "= .001"],
    [0.000999, "< .001"],
    [1e-12, "< .001"],
    [0.5, "= .500"],
    [0.9996, "> .999"],
    [1, "> .999"],
    [0, "< .001"],
  ])("%s → %s", (p, expected) => expect(formatP(p)).toBe(expected));

  it.each([NaN, Infinity, -0.1, 1.2])("never prints %s", (p) => expect(formatP(p)).toBe("—"));
});

describe("formatStat", () => {
  it("rounds to two decimals with a true minus sign", () => {
    expect(formatStat(4.2149)).toBe("4.21");
    expect(formatStat(-1.5)).toBe("\u22121.50");
    expect(formatStat(-0.001)).toBe("0.00");
    expect(formatStat(3, 0)).toBe("3");
  });
  it("never prints NaN or Infinity", () => {
    expect(formatStat(NaN)).toBe("—");
    expect(formatStat(-Infinity)).toBe("—");
  });
});

describe("formatDf", () => {
  it("keeps whole df and gives Welch's fractional df one decimal", () => {
    expect(formatDf(27)).toBe("27");
    expect(formatDf(15.348)).toBe("15.3");
    expect(formatDf(NaN)).toBe("—");
  });
});

describe("web helpers", () => {
  it("drops the leading zero of bounded statistics", () => {
    expect(formatBounded(0.1712)).toBe(".17");
    expect(formatBounded(-0.02)).toBe("\u2212.02");
    expect(formatBounded(1)).toBe("1.00");
  });
  it("formats α and sizes", () => {
    expect(formatAlpha(0.05)).toBe(".05");
    expect(formatAlpha(0.01)).toBe(".01");
    expect(formatBytes(812)).toBe("812 B");
    expect(formatBytes(14_200)).toBe("14.2 kB");
  });
});
