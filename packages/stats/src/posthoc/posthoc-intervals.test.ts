import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { hodgesLehmannShift } from "./hodges-lehmann-shift.js";
import { mannWhitneyLowerTail } from "./mann-whitney-null.js";
import { pairwiseDifferenceAfter, pairwiseDifferenceOrder } from "./pairwise-difference-order.js";
import { welchControlIntervals } from "./welch-control-intervals.js";

/**
 * Intervals for the post-hoc families against an independent Python implementation
 * (numpy 1.24.2 / scipy 1.10.1 on Debian), written from the published formulas:
 * test/fixtures/python/posthoc_intervals_runner.py, output committed as
 * test/fixtures/python/posthoc-intervals.json (seeded invented data inside the fixture).
 */
interface HlCase {
  name: string;
  a: number[];
  b: number[];
  level: number;
  expected: {
    estimate: number;
    method: "exact" | "normal";
    c: number;
    lower?: number;
    upper?: number;
    achievedLevel?: number;
  };
}
interface WelchCase {
  name: string;
  groups: Record<string, number[]>;
  control: string;
  alpha: number;
  expected: { a: string; b: string; diff: number; lower: number; upper: number }[];
}
const fixture = JSON.parse(
  readFileSync(new URL("../../test/fixtures/python/posthoc-intervals.json", import.meta.url), "utf8"),
) as { versions: Record<string, string>; hodgesLehmann: HlCase[]; welchControl: WelchCase[] };

const sorted = (v: number[]) => Float64Array.from(v).sort();
const close = (x: number, y: number, rel = 1e-12) =>
  expect(Math.abs(x - y)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(y)));

describe(`Hodges–Lehmann shift and interval vs numpy/scipy ${fixture.versions.scipy}`, () => {
  for (const c of fixture.hodgesLehmann) {
    it(`${c.name} at level ${c.level.toFixed(4)} (${c.expected.method})`, () => {
      const r = hodgesLehmannShift(sorted(c.a), sorted(c.b), c.level);
      close(r.estimate, c.expected.estimate);
      if (c.expected.c < 1) {
        expect(r.intervalAvailable).toBe(false);
        if (!r.intervalAvailable) expect(r.intervalReason).toMatch(/widest distribution-free interval/);
        return;
      }
      if (!r.intervalAvailable) throw new Error(r.intervalReason);
      expect(r.intervalMethod).toBe(c.expected.method);
      close(r.lower, c.expected.lower as number);
      close(r.upper, c.expected.upper as number);
      close(r.achievedLevel, c.expected.achievedLevel as number, 1e-10);
    });
  }
});

describe(`Welch intervals against a control vs scipy ${fixture.versions.scipy} (t.ppf)`, () => {
  for (const c of fixture.welchControl) {
    it(`${c.name}: Bonferroni over k − 1 comparisons`, () => {
      const summaries = Object.entries(c.groups).map(([name, v]) => {
        const mean = v.reduce((s, x) => s + x, 0) / v.length;
        const variance = v.reduce((s, x) => s + (x - mean) ** 2, 0) / (v.length - 1);
        return { name, n: v.length, mean, variance };
      });
      const r = welchControlIntervals(summaries, c.control, c.alpha);
      expect(r).toHaveLength(c.expected.length);
      r.forEach((p, i) => {
        const e = c.expected[i]!;
        if (!p.available) throw new Error(p.reason);
        expect([p.a, p.b]).toEqual([e.a, e.b]);
        close(p.diff, e.diff, 1e-10);
        close(p.lower, e.lower, 1e-8); // t quantiles (betaincinv vs t.ppf) agree to about 1e-9
        close(p.upper, e.upper, 1e-8);
        expect(p.intervalAdjustment).toBe("bonferroni");
        close(p.intervalLevel, 1 - c.alpha / (Object.keys(c.groups).length - 1));
      });
    });
  }

  it("a pair of two constant groups says why it has no interval", () => {
    const r = welchControlIntervals(
      [
        { name: "C", n: 3, mean: 1, variance: 0 },
        { name: "A", n: 3, mean: 2, variance: 0 },
        { name: "B", n: 4, mean: 2, variance: 1 },
      ],
      "C",
    );
    expect(r[0]!.available).toBe(false);
    if (!r[0]!.available) expect(r[0]!.reason).toMatch(/'A' against 'C'.*0\/0/);
    expect(r[1]!.available).toBe(true);
  });
});

describe("exact Mann–Whitney null distribution", () => {
  it("n = m = 2: P(U ≤ u) = 1/6, 2/6, 4/6 (all 6 orderings counted by hand)", () => {
    const t = mannWhitneyLowerTail(2, 2);
    close(t[0]!, 1 / 6);
    close(t[1]!, 2 / 6);
  });
  it("n = m = 6: P(U ≤ 5) = 0.0205628 (scipy 1.10.1 _mwu_state.cdf)", () => {
    close(mannWhitneyLowerTail(6, 6)[5]!, 0.020562770562770564, 1e-12);
  });
  it("P(U = 0) = 1/C(n + m, n) (only one ordering puts every y above every x)", () => {
    close(mannWhitneyLowerTail(7, 12)[0]!, 1 / 50388, 1e-12);
  });
});

describe("order statistics of pairwise differences", () => {
  it("equal every position of the fully sorted difference list (property)", () => {
    const x = sorted([3.1, -2, 0, 0, 7.5, 1e-9, 2, 2, 2]);
    const y = sorted([1, 1, -4.25, 0, 3.1, 8]);
    const all: number[] = [];
    for (const a of x) for (const b of y) all.push(a - b);
    all.sort((p, q) => p - q);
    all.forEach((d, i) => expect(pairwiseDifferenceOrder(x, y, i + 1)).toBe(d));
  });

  it("equal the fully sorted list when the sampled search runs, with heavy ties and without (property)", () => {
    let seed = 7;
    const next = () => ((seed = (seed * 48271) % 2147483647), seed / 2147483647);
    for (const grid of [1, 0]) {
      const draw = (k: number, shift: number) =>
        sorted(
          Array.from({ length: k }, () => (grid ? Math.round(next() * 12) + shift : next() * 12 + shift)),
        );
      const x = draw(700, 2);
      const y = draw(900, 0);
      const all = new Float64Array(x.length * y.length);
      let k = 0;
      for (const a of x) for (const b of y) all[k++] = a - b;
      all.sort();
      for (const r of [1, 2, 1000, 123457, 315000, 315001, 500000, all.length - 1, all.length]) {
        const d = pairwiseDifferenceOrder(x, y, r);
        expect(d).toBe(all[r - 1]);
        if (r < all.length) expect(pairwiseDifferenceAfter(x, y, r, d)).toBe(all[r]);
      }
    }
  });
});

describe("published worked example", () => {
  it("Hodges & Lehmann shift of the permeability data = 0.305 (Hollander & Wolfe 1973, p. 69, as quoted in R's wilcox.test help; from memory)", () => {
    const x = [0.8, 0.83, 1.89, 1.04, 1.45, 1.38, 1.91, 1.64, 0.73, 1.46];
    const y = [1.15, 0.88, 0.9, 0.74, 1.21];
    close(hodgesLehmannShift(sorted(x), sorted(y), 0.95).estimate, 0.305, 1e-12);
  });
});
