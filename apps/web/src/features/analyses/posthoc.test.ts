import { describe, expect, it } from "vitest";
import { engineResult } from "@/test/engine-fixtures";
import { posthocView } from "./posthoc";

// Real engine output on seeded invented data (src/test/engine-fixtures.ts).
const r = engineResult("equal-spread", { control: "Epoxy" });

describe("posthocView", () => {
  it("takes the family matched to the test, with the engine's Hedges' g per pair", () => {
    const v = posthocView("anova", "all-pairs", r);
    if (!("rows" in v) || !Array.isArray(r.posthoc.tukey)) throw new Error("Tukey–Kramer pairs expected");
    expect(v.rows).toHaveLength(3);
    const pair = r.posthoc.tukey[0]!;
    expect(v.rows[0]).toEqual({
      a: pair.a,
      b: pair.b,
      diff: pair.diff,
      lower: pair.lower,
      upper: pair.upper,
      pAdj: pair.pAdj,
      effect: pair.hedgesG.available ? pair.hedgesG.g : null,
    });
    expect(v.effectLabel).toBe("g");
    expect(v.hasIntervals).toBe(true);
  });

  it("Dunn's rows carry the rank-biserial r and the Hodges–Lehmann shift with its interval", () => {
    const v = posthocView("kruskal-wallis", "all-pairs", r);
    if (!("rows" in v) || !Array.isArray(r.posthoc.dunn)) throw new Error("Dunn pairs expected");
    const pair = r.posthoc.dunn[0]! as (typeof r.posthoc.dunn)[number] & {
      shift?: number;
      lower?: number;
      upper?: number;
    };
    expect(v.rows[0]).toMatchObject({
      effect: pair.rankBiserial.available ? pair.rankBiserial.r : null,
      diff: pair.shift,
      lower: pair.lower,
      upper: pair.upper,
      pAdj: pair.pAdj,
    });
    // The shift lies inside its own interval (Hodges & Lehmann 1963: the estimate is the median of the differences the interval brackets).
    expect(v.rows[0]!.diff!).toBeGreaterThanOrEqual(v.rows[0]!.lower!);
    expect(v.rows[0]!.diff!).toBeLessThanOrEqual(v.rows[0]!.upper!);
    expect(v.centreLabel).toBe("shift");
    expect(v.hasIntervals).toBe(true);
    expect(v.effectLabel).toBe("r");
  });

  it("comparisons with the control come from the test's control family: k − 1 pairs, each with the control", () => {
    for (const test of ["anova", "welch", "kruskal-wallis"] as const) {
      const v = posthocView(test, "vs-control", r);
      if (!("rows" in v)) throw new Error(`${test}: control comparisons expected`);
      expect(v.rows).toHaveLength(2);
      for (const row of v.rows) expect([row.a, row.b]).toContain("Epoxy");
    }
  });

  it("gives the engine's reason when the family could not run", () => {
    const none = engineResult("identical");
    const v = posthocView("anova", "all-pairs", none);
    expect(v).toEqual({
      unavailable: expect.stringMatching(/^Tukey–Kramer needs the classic ANOVA's error variance/),
    });
    // No control was named, so comparisons with one cannot be read.
    expect(posthocView("anova", "vs-control", engineResult("equal-spread"))).toEqual({
      unavailable: expect.stringMatching(/no control group was named/),
    });
  });
});
