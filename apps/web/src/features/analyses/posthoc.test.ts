import { describe, expect, it } from "vitest";
import { posthocView } from "./posthoc";
import { unavailableResult } from "@/test/make-study";
import type { AnalysisResult } from "@/features/studies/types";

// Shapes as the engine's runPosthoc sends them; the numbers are invented.
const base: AnalysisResult = {
  ...unavailableResult(),
  posthoc: {
    tukey: [
      {
        a: "A",
        b: "B",
        diff: 1.5,
        lower: -0.5,
        upper: 3.5,
        pAdj: 0.2,
        hedgesG: { available: true, g: 0.71, d: 0.74 },
      },
    ],
    gamesHowell: { available: false, reason: "Games–Howell needs every group's variance above zero" },
    dunn: [{ a: "A", b: "B", z: 2.1, p: 0.03, pAdj: 0.09, rankBiserial: { available: true, r: 0.42 } }],
    control: {
      control: "A",
      dunnett: [
        {
          a: "B",
          b: "A",
          diff: -1.5,
          lower: -3.2,
          upper: 0.2,
          pAdj: 0.08,
          hedgesG: { available: false, reason: "too few values" },
        },
      ],
      welchHolm: { available: false, reason: "zero variance" },
      dunn: [],
    },
  },
};

describe("posthocView", () => {
  it("takes the family matched to the test and the engine's Hedges' g", () => {
    const v = posthocView("anova", "all-pairs", base);
    expect("rows" in v && v.rows[0]).toMatchObject({
      a: "A",
      b: "B",
      diff: 1.5,
      lower: -0.5,
      upper: 3.5,
      pAdj: 0.2,
      effect: 0.71,
    });
    expect("rows" in v && v.effectLabel).toBe("g");
  });

  it("Dunn's rows carry the rank-biserial r and no interval", () => {
    const v = posthocView("kruskal-wallis", "all-pairs", base);
    expect("rows" in v && v.rows[0]).toMatchObject({ effect: 0.42, lower: null, upper: null, pAdj: 0.09 });
    expect("rows" in v && v.hasIntervals).toBe(false);
  });

  it("comparisons with the control come from the control family of the test", () => {
    const v = posthocView("anova", "vs-control", base);
    expect("rows" in v && v.rows.map((r) => `${r.a}-${r.b}`)).toEqual(["B-A"]);
    expect(posthocView("welch", "vs-control", base)).toEqual({ unavailable: "zero variance." });
  });

  it("gives the reason when the family is unavailable", () => {
    expect(posthocView("welch", "all-pairs", base)).toEqual({
      unavailable: "Games–Howell needs every group's variance above zero.",
    });
    expect(posthocView("anova", "all-pairs", unavailableResult())).toEqual({
      unavailable: "post-hoc comparisons are not integrated yet.",
    });
  });
});
