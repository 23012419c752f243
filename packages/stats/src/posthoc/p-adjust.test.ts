import { describe, expect, it } from "vitest";
import { adjustPValues } from "./p-adjust.js";

describe("adjustPValues", () => {
  const p = [0.01, 0.04, 0.03, 0.005, 0.2];

  it("Holm: worked by hand, ≥ the raw p, ≤ Bonferroni, monotone in the raw order", () => {
    expect(adjustPValues([0.01, 0.04, 0.03], "holm")).toEqual([0.03, 0.06, 0.06]);
    const holm = adjustPValues(p, "holm");
    const bonf = adjustPValues(p, "bonferroni");
    const order = p.map((_, i) => i).sort((i, j) => p[i]! - p[j]!);
    for (let r = 1; r < order.length; r++)
      expect(holm[order[r]!]!).toBeGreaterThanOrEqual(holm[order[r - 1]!]!);
    holm.forEach((h, i) => {
      expect(h).toBeGreaterThanOrEqual(p[i]!);
      expect(h).toBeLessThanOrEqual(bonf[i]!);
    });
  });

  it("BH is never above Holm and never above 1", () => {
    const bh = adjustPValues(p, "bh");
    const holm = adjustPValues(p, "holm");
    bh.forEach((b, i) => {
      expect(b).toBeLessThanOrEqual(holm[i]! + 1e-15);
      expect(b).toBeLessThanOrEqual(1);
    });
    expect(adjustPValues([0.9, 0.95], "bh")).toEqual([0.95, 0.95]);
  });

  it("never modifies its input and handles empty and single families", () => {
    const input = [0.3, 0.6];
    adjustPValues(input, "bonferroni");
    adjustPValues(input, "holm");
    expect(input).toEqual([0.3, 0.6]);
    expect(adjustPValues([], "holm")).toEqual([]);
    expect(adjustPValues([0.02], "bh")).toEqual([0.02]);
    expect(adjustPValues([0.6, 0.7], "bonferroni")).toEqual([1, 1]);
  });

  it("rejects values outside [0, 1] and unknown methods", () => {
    expect(() => adjustPValues([0.1, 1.5], "holm")).toThrow(/p-value 2 is 1.5/);
    expect(() => adjustPValues([0.1, Number.NaN], "holm")).toThrow(/p-value 2 is NaN/);
    expect(() => adjustPValues([0.1], "sidak" as never)).toThrow(/"holm", "bonferroni", "bh" or "none"/);
  });
});
