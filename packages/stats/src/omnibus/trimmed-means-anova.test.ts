import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { StatsInputError } from "../errors.js";
import { trimmedMeansAnova } from "./trimmed-means-anova.js";
import { welchAnova } from "./welch-anova.js";

interface Case {
  name: string;
  source: string;
  groups: number[][];
  F: number;
  df1: number;
  df2?: number;
  p: number;
  trimmedMeans?: number[];
  winsorizedVariances?: number[];
  h?: number[];
}
const fixture = JSON.parse(
  readFileSync(new URL("../../test/fixtures/trimmed-means-anova/expected.json", import.meta.url), "utf8"),
) as { cases: Case[]; trim: number };

const asGroups = (gs: number[][]) => gs.map((values, i) => ({ name: `G${i + 1}`, values }));
const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("trimmedMeansAnova", () => {
  for (const c of fixture.cases) {
    it(`${c.name} — source: ${c.source}`, () => {
      const r = trimmedMeansAnova(asGroups(c.groups), fixture.trim);
      if (!r.available) throw new Error(r.reason);
      expect(rel(r.F, c.F)).toBeLessThan(1e-10);
      expect(r.df1).toBe(c.df1);
      expect(rel(r.p, c.p)).toBeLessThan(1e-8);
      if (c.df2 !== undefined) expect(rel(r.df2, c.df2)).toBeLessThan(1e-10);
      if (c.trimmedMeans) {
        r.trimmedMeans.forEach((t, j) => {
          expect(rel(t.trimmedMean, c.trimmedMeans?.[j] as number)).toBeLessThan(1e-12);
          expect(rel(t.winsorizedVariance, c.winsorizedVariances?.[j] as number)).toBeLessThan(1e-10);
          expect(t.h).toBe(c.h?.[j]);
        });
      }
    });
  }

  it("hand example: trimmed means 3 and 6, winsorized variances 1, F = 6.75 on (1, 4) (hand computation from Yuen 1974)", () => {
    const r = trimmedMeansAnova([
      { name: "A", values: [1, 2, 3, 4, 5] },
      { name: "B", values: [3, 5, 6, 7, 30] },
    ]);
    if (!r.available) throw new Error(r.reason);
    expect(r.trimmedMeans.map((t) => t.trimmedMean)).toEqual([3, 6]);
    expect(r.trimmedMeans.map((t) => t.winsorizedVariance)).toEqual([1, 1]);
    expect(r.F).toBeCloseTo(6.75, 12);
    expect(r.df2).toBeCloseTo(4, 12);
  });

  it("with trim 0 it is Welch's ANOVA (property of the formula: no trimming leaves Welch 1951)", () => {
    const groups = asGroups(fixture.cases[5]?.groups ?? []);
    const t = trimmedMeansAnova(groups, 0);
    const w = welchAnova(groups);
    if (!t.available || !w.available) throw new Error("unavailable");
    expect(rel(t.F, w.F)).toBeLessThan(1e-12);
    expect(rel(t.df2, w.df2)).toBeLessThan(1e-12);
  });

  it("reports trimmed means in the data's units for large offsets (exact centring)", () => {
    const r = trimmedMeansAnova([
      { name: "A", values: ["1000000000000.1", "1000000000000.2", "1000000000000.3"] },
      { name: "B", values: ["1000000000000.4", "1000000000000.6", "1000000000000.9"] },
    ]);
    if (!r.available) throw new Error(r.reason);
    expect(r.trimmedMeans[0]?.trimmedMean).toBe(1000000000000.2);
  });

  it("explains a zero winsorized variance and rejects groups too small to trim", () => {
    const r = trimmedMeansAnova([
      { name: "A", values: [1, 5, 5, 5, 9] },
      { name: "B", values: [1, 2, 3, 4, 5] },
    ]);
    expect(r).toEqual({
      available: false,
      reason: expect.stringMatching(/group 'A' has zero winsorized variance/),
    });
    expect(() =>
      trimmedMeansAnova(
        [
          { name: "A", values: [1, 2] },
          { name: "B", values: [1, 2, 3, 4] },
        ],
        0.49,
      ),
    ).not.toThrow();
    expect(() =>
      trimmedMeansAnova(
        [
          { name: "A", values: [1, 2, 3] },
          { name: "B", values: [1, 2, 3] },
        ],
        0.4,
      ),
    ).toThrow(StatsInputError);
    expect(() =>
      trimmedMeansAnova(
        [
          { name: "A", values: [1, 2, 3] },
          { name: "B", values: [1, 2, 3] },
        ],
        0.5,
      ),
    ).toThrow(/trim between 0 and 0.5/);
  });
});
