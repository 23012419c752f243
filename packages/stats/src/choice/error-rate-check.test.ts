import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { describe, expect, it } from "vitest";
import { sampleFromArrays } from "../numeric/sample-from-arrays.js";
import { kruskalWallis } from "../omnibus/kruskal-wallis.js";
import { oneWayAnova } from "../omnibus/one-way-anova.js";
import { trimmedMeansAnova } from "../omnibus/trimmed-means-anova.js";
import { welchAnova } from "../omnibus/welch-anova.js";
import { errorRateCheck, errorRateRuns } from "./error-rate-check.js";
import {
  drawReplicate,
  replicateScratch,
  replicateStatistics,
  resamplingFrame,
  STAT,
  STAT_COUNT,
} from "./resampled-null-statistics.js";
import { mixtureCentres } from "./smoothed-null-centres.js";

// Seeded invented data: normal groups (Box–Muller) with the given sizes, SDs and decimals.
function normalGroups(seed: number, sizes: number[], sds: number[], decimals = 3) {
  const rng = xoroshiro128plus(seed);
  const scale = 10 ** decimals;
  return sizes.map((n, g) => ({
    name: `G${g + 1}`,
    values: Array.from({ length: n }, () => {
      const u = 1 - uniformFloat64(rng);
      const z = Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniformFloat64(rng));
      return Math.round((50 + (sds[g] as number) * z) * scale) / scale;
    }),
  }));
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("replicateStatistics (the simulation's kernels)", () => {
  it("equal oneWayAnova, welchAnova, kruskalWallis and trimmedMeansAnova on the same replicate to 1e-10 (the library functions, which are checked against scipy and NIST)", () => {
    // One decimal and no smoothing make many ties, within and across groups, for the rank kernel.
    for (const [seed, sizes, sds, decimals, smooth] of [
      [1, [8, 25, 15, 40], [10, 1, 1, 1], 1, false],
      [1, [8, 25, 15, 40], [10, 1, 1, 1], 1, true],
      [2, [5, 5, 5], [1, 2, 3], 3, true],
      [3, [12, 7, 30], [1, 1, 4], 0, false],
    ] as const) {
      const data = normalGroups(seed, [...sizes], [...sds], decimals);
      const residuals = data.map((g) => {
        const m = g.values.reduce((s, x) => s + x, 0) / g.values.length;
        return Float64Array.from(g.values, (x) => x - m);
      });
      const frame = resamplingFrame(residuals, 0.2, smooth);
      const rng = xoroshiro128plus(seed + 100);
      const scratch = replicateScratch(frame.k);
      const out = new Float64Array(STAT_COUNT);
      const values = new Float64Array(frame.N);
      for (let rep = 0; rep < 25; rep++) {
        drawReplicate(frame, rng, values);
        replicateStatistics(frame, values, scratch, out);
        const block = (g: number, shift: number) =>
          values.subarray(frame.start[g] as number, frame.start[g + 1] as number).map((v) => v + shift);
        const groups = (shifts: Float64Array | undefined) =>
          sampleFromArrays(
            Array.from({ length: frame.k }, (_, g) => ({
              name: `G${g + 1}`,
              values: block(g, shifts ? (shifts[g] as number) : 0),
            })),
          );
        const a = oneWayAnova(groups(undefined));
        const w = welchAnova(groups(undefined));
        const h = kruskalWallis(groups(frame.medianShift), { permutation: false });
        const t = trimmedMeansAnova(groups(frame.trimShift), 0.2);
        if (a.available) expect(rel(out[STAT.anovaF] as number, a.F)).toBeLessThan(1e-10);
        else expect(out[STAT.anovaF]).toBeNaN();
        if (w.available) {
          expect(rel(out[STAT.welchF] as number, w.F)).toBeLessThan(1e-10);
          expect(rel(out[STAT.welchDf2] as number, w.df2)).toBeLessThan(1e-10);
        } else expect(out[STAT.welchF]).toBeNaN();
        if (h.available) expect(rel(out[STAT.kruskalWallisH] as number, h.H)).toBeLessThan(1e-10);
        else expect(out[STAT.kruskalWallisH]).toBeNaN();
        if (t.available) {
          expect(rel(out[STAT.trimmedF] as number, t.F)).toBeLessThan(1e-10);
          expect(rel(out[STAT.trimmedDf2] as number, t.df2)).toBeLessThan(1e-10);
        } else expect(out[STAT.trimmedF]).toBeNaN();
      }
    }
  });

  it("replicates keep each group's mean at 0 and its SD on average (property of the shrunk smoothed bootstrap, Silverman & Young 1987)", () => {
    const residuals = [Float64Array.of(-3, -1, 0, 1, 3), Float64Array.of(-10, 2, 8)];
    const frame = resamplingFrame(residuals, 0.2, true);
    const rng = xoroshiro128plus(9);
    const values = new Float64Array(frame.N);
    let sum = 0;
    let sumSq = 0;
    const R = 20000;
    for (let r = 0; r < R; r++) {
      drawReplicate(frame, rng, values);
      for (let i = 0; i < 5; i++) {
        sum += values[i] as number;
        sumSq += (values[i] as number) ** 2;
      }
    }
    const m = sum / (5 * R);
    const v = sumSq / (5 * R) - m * m;
    // Population variance of the smoothed law: s²·((n − 1)/n + h²)/(1 + h²), s² = 5.
    const h = frame.bandwidth[0] as number;
    const target = (5 * (0.8 + h * h)) / (1 + h * h);
    expect(Math.abs(m)).toBeLessThan(4 * Math.sqrt(target / (5 * R)));
    expect(Math.abs(v - target) / target).toBeLessThan(0.02);
  });
});

describe("mixtureCentres", () => {
  it("median and 20% trimmed mean of (1/3)ΣN(eᵢ, 0.5²), e = −1, 0, 4 (scipy 1.10.1: brentq on the mixture cdf, quad for the trimmed mean)", () => {
    const c = mixtureCentres(Float64Array.of(-1, 0, 4), 0.5, 0.2);
    expect(c.median).toBeCloseTo(0.025272146448092465, 11);
    expect(c.trimmedMean).toBeCloseTo(0.6707171799284177, 11);
  });

  it("symmetric atoms have median and trimmed mean 0 (symmetry)", () => {
    const c = mixtureCentres(Float64Array.of(-2, -0.5, 0.5, 2), 0.3, 0.2);
    expect(Math.abs(c.median)).toBeLessThan(1e-12);
    expect(Math.abs(c.trimmedMean)).toBeLessThan(1e-12);
  });
});

// The check's result when it runs (it is unavailable only above 50,000 values).
function check(...args: Parameters<typeof errorRateCheck>) {
  const r = errorRateCheck(...args);
  if (!r.available) throw new Error(r.reason);
  return r;
}

describe("errorRateCheck", () => {
  it("normal data, equal SDs and equal n: the classic ANOVA rate is within 3 Monte Carlo SE of α (the F test is exact under normality — Fisher; common practice)", () => {
    const r = check(normalGroups(11, [60, 60, 60], [1, 1, 1]));
    if (!r.rates.anova.available) throw new Error(r.rates.anova.reason);
    expect(Math.abs(r.rates.anova.rate - 0.05)).toBeLessThan(3 * Math.sqrt((0.05 * 0.95) / r.runs));
    expect(r.runs).toBe(2000);
  });

  it("largest SD in the smallest group: classic ANOVA is liberal, Welch's ANOVA close to α in large groups (Glass, Peckham & Sanders 1972, Review of Educational Research 42, 237–288; Welch 1951; from memory)", () => {
    const small = check(normalGroups(12, [16, 50, 30, 80], [10, 1, 1, 1]));
    const large = check(normalGroups(12, [64, 200, 120, 320], [10, 1, 1, 1]));
    for (const r of [small, large]) {
      const { anova, welch } = r.rates;
      if (!anova.available || !welch.available) throw new Error("unavailable");
      expect(anova.rate).toBeGreaterThan(0.15);
      expect(welch.rate).toBeLessThan(anova.rate / 2);
      expect(anova.standardError).toBeCloseTo(
        Math.sqrt((anova.rate * (1 - anova.rate)) / anova.runsComputed),
        15,
      );
    }
    const welch = large.rates.welch;
    if (!welch.available) throw new Error(welch.reason);
    expect(Math.abs(welch.rate - 0.05)).toBeLessThan(3 * welch.standardError + 0.01);
  });

  it("the same seed gives the same result; another seed gives other draws (property of a seeded generator)", () => {
    const data = normalGroups(13, [10, 12, 9], [1, 2, 3]);
    expect(check(data, { seed: 5 })).toEqual(check(data, { seed: 5 }));
    expect(check(data, { seed: 5 }).rates).not.toEqual(check(data, { seed: 6 }).rates);
  });

  it("a zero-variance group: Welch and the trimmed test are unavailable with the reason, the others are still checked", () => {
    const data = normalGroups(14, [10, 10, 10], [1, 1, 1]);
    data[1] = { name: "G2", values: Array(10).fill(7) };
    const r = check(data, { runs: 200 });
    expect(r.rates.welch).toEqual({
      available: false,
      reason: expect.stringMatching(/group 'G2' has zero variance/),
    });
    expect(r.rates.trimmedMeans.available).toBe(false);
    expect(r.rates.anova.available).toBe(true);
    expect(r.rates.kruskalWallis.available).toBe(true);
    expect(r.notes.join(" ")).toMatch(/covers classic one-way ANOVA, Kruskal–Wallis\./);
  });

  it("is not run above 50,000 values, with the reason (bounded work)", () => {
    const r = errorRateCheck(normalGroups(17, [30000, 30000], [1, 1], 1));
    expect(r).toEqual({
      available: false,
      reason: expect.stringMatching(/with 60000 values \(more than 50000\)/),
    });
  });

  it("reduces the runs above 2,000 values by the stated rule", () => {
    expect(errorRateRuns(2000)).toBe(2000);
    expect(errorRateRuns(4000)).toBe(1000);
    expect(errorRateRuns(100_000)).toBe(200);
    const r = check(normalGroups(15, [1500, 1500, 1000], [1, 1, 1]));
    expect(r.runs).toBe(1000);
    expect(r.notes[0]).toMatch(/ran 1000 simulated data sets instead of 2000/);
  });

  it("rejects bad options with the reason", () => {
    const data = normalGroups(16, [5, 5], [1, 1]);
    expect(() => check(data, { alpha: 1 })).toThrow(/alpha between 0 and 1/);
    expect(() => check(data, { runs: 1e9 })).toThrow(/between 1 and 20000 runs/);
    expect(() =>
      check([
        { name: "A", values: [1] },
        { name: "B", values: [1, 2] },
      ]),
    ).toThrow(/at least two values/);
  });
});
