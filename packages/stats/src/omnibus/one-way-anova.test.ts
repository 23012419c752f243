import { describe, expect, it } from "vitest";
import { StatsInputError } from "../errors.js";
import { oneWayAnova } from "./one-way-anova.js";

describe("oneWayAnova", () => {
  it("matches a hand computation", () => {
    // Means 2 and 5, grand 3.5: SS_B = 3·1.5²·2 = 13.5, SS_W = 2 + 2 = 4, F = 13.5/(4/4) = 13.5.
    const a = oneWayAnova([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 5, 6] },
    ]);
    if (!a.available) throw new Error(a.reason);
    expect(a.ssBetween).toBe(13.5);
    expect(a.ssWithin).toBe(4);
    expect(a.F).toBe(13.5);
    expect(a.etaSquared).toBeCloseTo(13.5 / 17.5, 15);
    expect(a.omegaSquared).toBeCloseTo((13.5 - 1) / (17.5 + 1), 15);
    expect(a.cohensF).toBeCloseTo(Math.sqrt(13.5 / 4), 15);
    // scipy 1.10.1 f_oneway([1,2,3],[4,5,6]).pvalue = 0.02131164112875672
    expect(a.p).toBeCloseTo(0.02131164112875672, 14);
  });

  it("is unavailable, with the reason, when all groups are constant (the negative-F trap)", () => {
    const same = oneWayAnova([
      { name: "A", values: [5, 5, 5] },
      { name: "B", values: [5, 5] },
    ]);
    expect(same).toEqual({ available: false, reason: expect.stringMatching(/All values are identical/) });
    const constantGroups = oneWayAnova([
      { name: "A", values: [1, 1, 1] },
      { name: "B", values: [2, 2] },
    ]);
    expect(constantGroups).toEqual({
      available: false,
      reason: expect.stringMatching(/Every group is constant/),
    });
  });

  it("does not depend on the order of groups or values", () => {
    const g = [
      { name: "A", values: [1.1, 2.7, 3.2, 0.4] },
      { name: "B", values: [5.5, 4.1, 6.3] },
      { name: "C", values: [2, 2.5] },
    ];
    const a = oneWayAnova(g);
    const b = oneWayAnova([...g].reverse().map((x) => ({ ...x, values: [...x.values].reverse() })));
    if (!a.available || !b.available) throw new Error("unavailable");
    expect(b.F).toBeCloseTo(a.F, 12);
  });

  it("throws for fewer than two groups or an empty group", () => {
    expect(() => oneWayAnova([{ name: "A", values: [1, 2] }])).toThrow(
      new StatsInputError("One-way ANOVA needs at least two groups; found 1"),
    );
    expect(() =>
      oneWayAnova([
        { name: "A", values: [1, 2] },
        { name: "B", values: [] },
      ]),
    ).toThrow(new StatsInputError("One-way ANOVA needs at least one value in every group; group 'B' has 0"));
  });

  it("gives log10 p where p underflows: df1 = 2 has the closed form P(F > f) = (d2/(d2 + 2f))^(d2/2) (Abramowitz & Stegun 26.6.4, from memory)", () => {
    // Three tight, far-apart groups of 400: F is huge and p is far below the smallest double.
    const group = (centre: number) => Array.from({ length: 400 }, (_, i) => centre + ((i % 7) - 3) / 10);
    const a = oneWayAnova([
      { name: "A", values: group(0) },
      { name: "B", values: group(1) },
      { name: "C", values: group(2) },
    ]);
    if (!a.available) throw new Error(a.reason);
    expect(a.p).toBe(0);
    const closed = (a.df2 / 2) * Math.log10(a.df2 / (a.df2 + 2 * a.F));
    expect(closed).toBeLessThan(-700);
    expect(Math.abs(a.log10p - closed) / Math.abs(closed)).toBeLessThan(1e-12);
  });

  it("log10 p agrees with log10 of p in the ordinary range (identity)", () => {
    const a = oneWayAnova([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 5, 6] },
    ]);
    if (!a.available) throw new Error(a.reason);
    expect(a.log10p).toBeCloseTo(Math.log10(a.p), 12);
  });
});
