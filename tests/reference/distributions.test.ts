import { describe, expect, it } from "vitest";
import { runPython } from "./python.js";
import {
  studentizedRangeCdf,
  studentizedRangeQuantile,
  studentizedRangeSf,
} from "../../packages/stats/src/distributions/studentized-range.js";
import { noncentralFCdf, noncentralFSf } from "../../packages/stats/src/distributions/noncentral-f.js";

/**
 * Distribution functions against scipy 1.10.1 (Debian) and mpmath 1.2.1, run by
 * tests/reference/python/distributions_runner.py. Each check names the reference function.
 * scipy's studentized_range integrates with epsabs = 1e-11 and forms sf as 1 − cdf, so it is
 * an absolute reference only; far tails are checked against mpmath (40 digits) and against
 * the exact k = 2 identity P(Q > q) = 2·P(T > q/√2) with scipy.stats.t.sf.
 */

interface Reference {
  versions: { scipy: string; mpmath: string };
  sr: [number, number][];
  srPpf: number[];
  srMp: number[];
  tSf: number[];
  ncf: [number, number][];
  ncfMp: [number, number][];
}

const DFS = [2, 3, 5, 10, 30, 120, 1000];
const KS = [2, 3, 4, 6, 10, 15, 20];
const QS = [1, 3, 4.5, 7];
const sr: [number, number, number][] = [];
for (const df of DFS) for (const k of KS) for (const q of QS) sr.push([q, k, df]);

const srPpf: [number, number, number][] = [];
for (const df of [2, 5, 30, 1000])
  for (const k of [2, 5, 10, 20]) for (const p of [0.5, 0.95, 0.99]) srPpf.push([p, k, df]);

// Far upper tails of the infinite-df range, values between 1e-28 and 1e-5.
const srMp: [number, number][] = [
  [12, 4],
  [8, 10],
  [15, 20],
  [10, 3],
  [14, 2],
];
// k = 2, finite df: P(Q > q) = 2·P(T_ν > q/√2) exactly.
const tTail: [number, number][] = [
  [20, 3],
  [50, 2],
  [12, 10],
  [9, 30],
  [7, 1000],
];

const ncf: [number, number, number, number][] = [];
for (const lambda of [0.5, 10, 100, 2000]) {
  for (const d1 of [1, 3, 10]) {
    for (const d2 of [5, 50, 1e5]) {
      const mean = (d2 / (d2 - 2)) * ((d1 + lambda) / d1);
      for (const m of [0.3, 1, 1.6]) ncf.push([m * mean, d1, d2, lambda]);
    }
  }
}
// Tails where scipy's answer is small; mpmath sums the Poisson–beta series at 25 digits.
const ncfMp: [number, number, number, number][] = [
  [50, 3, 100, 5],
  [12, 5, 20, 40],
  [0.05, 4, 30, 20],
  [25, 2, 1000, 8],
];

const ref = runPython<Reference>("distributions_runner.py", {
  sr,
  srPpf,
  srMp,
  tSf: tTail.map(([q, df]) => [q / Math.SQRT2, df]),
  ncf,
  ncfMp,
});

function worst(label: string, errors: number[]): number {
  const w = Math.max(...errors);
  console.log(`${label}: worst ${w.toExponential(2)}`);
  return w;
}

describe(`studentized range vs scipy ${ref.versions.scipy} and mpmath ${ref.versions.mpmath}`, () => {
  it("cdf and sf match scipy.stats.studentized_range.cdf/.sf within 1e-8 absolute (df 2–1000, k 2–20)", () => {
    const errors = sr.flatMap(([q, k, df], i) => {
      const [cdf, sf] = ref.sr[i] as [number, number];
      return [Math.abs(studentizedRangeCdf(q, k, df) - cdf), Math.abs(studentizedRangeSf(q, k, df) - sf)];
    });
    expect(worst("studentized range cdf/sf vs scipy (abs)", errors)).toBeLessThan(1e-8);
  });

  it("quantile matches scipy.stats.studentized_range.ppf within 1e-8 relative", () => {
    const errors = srPpf.map(([p, k, df], i) => {
      const expected = ref.srPpf[i] as number;
      return Math.abs(studentizedRangeQuantile(p, k, df) - expected) / expected;
    });
    expect(worst("studentized range quantile vs scipy (rel)", errors)).toBeLessThan(1e-8);
  });

  it("far upper tail, df = ∞, matches a 40-digit mpmath integral within 1e-9 relative", () => {
    const errors = srMp.map(([q, k], i) => {
      const expected = ref.srMp[i] as number;
      expect(expected).toBeGreaterThan(1e-30);
      return Math.abs(studentizedRangeSf(q, k, Infinity) - expected) / expected;
    });
    expect(worst("studentized range far tail vs mpmath (rel)", errors)).toBeLessThan(1e-9);
  });

  it("far upper tail, k = 2, equals 2·scipy.stats.t.sf(q/√2, df) within 1e-9 relative", () => {
    const errors = tTail.map(([q, df], i) => {
      const expected = 2 * (ref.tSf[i] as number);
      return Math.abs(studentizedRangeSf(q, 2, df) - expected) / expected;
    });
    expect(worst("studentized range k=2 tail vs t (rel)", errors)).toBeLessThan(1e-9);
  });
});

describe(`noncentral F vs scipy ${ref.versions.scipy} and mpmath ${ref.versions.mpmath}`, () => {
  it("cdf and sf match scipy.stats.ncf.cdf/.sf within 1e-8 absolute (λ ≤ 2000, d2 ≤ 1e5)", () => {
    const errors = ncf.flatMap(([x, d1, d2, lambda], i) => {
      const [cdf, sf] = ref.ncf[i] as [number, number];
      return [
        Math.abs(noncentralFCdf(x, d1, d2, lambda) - cdf),
        Math.abs(noncentralFSf(x, d1, d2, lambda) - sf),
      ];
    });
    expect(worst("noncentral F vs scipy (abs)", errors)).toBeLessThan(1e-8);
  });

  it("both tails match a 25-digit mpmath series within 1e-9 relative", () => {
    const errors = ncfMp.flatMap(([x, d1, d2, lambda], i) => {
      const [cdf, sf] = ref.ncfMp[i] as [number, number];
      return [
        Math.abs(noncentralFCdf(x, d1, d2, lambda) - cdf) / cdf,
        Math.abs(noncentralFSf(x, d1, d2, lambda) - sf) / sf,
      ];
    });
    expect(worst("noncentral F vs mpmath (rel)", errors)).toBeLessThan(1e-9);
  });
});
