import { describe, expect, it } from "vitest";
import { runPython } from "./python.js";
import { SCENARIOS, makeGroups, makeRng, msWithin, standardNormal, summarize } from "./generate.js";
import type { GroupValues } from "../../packages/stats/src/types/group-summary.js";
import { tukeyKramer } from "../../packages/stats/src/posthoc/tukey-kramer.js";
import { gamesHowell } from "../../packages/stats/src/posthoc/games-howell.js";
import { dunn } from "../../packages/stats/src/posthoc/dunn.js";
import { adjustPValues, type PAdjustMethod } from "../../packages/stats/src/posthoc/p-adjust.js";
import { welchVsControlHolm } from "../../packages/stats/src/posthoc/welch-vs-control-holm.js";
import { dunnettTest } from "../../packages/stats/src/posthoc/dunnett-test.js";
import { dunnettQuantile, dunnettSf } from "../../packages/stats/src/distributions/dunnett.js";
import { hedgesG } from "../../packages/stats/src/effect-sizes/hedges-g.js";

/**
 * Post-hoc methods against scipy 1.10.1 / statsmodels 0.13.5 (Debian), run by
 * tests/reference/python/posthoc_runner.py on seeded invented data (generate.ts).
 * Where no library function exists (Games–Howell, Dunn, Hedges' g) the runner writes the
 * published formula out with scipy's pieces, an implementation independent of ours.
 * scipy's studentized_range (used by tukey_hsd and the Games–Howell runner) is accurate to
 * about 1e-11 absolute, so p-values there are compared with 1e-8 absolute.
 */

const data = Object.fromEntries(
  Object.entries(SCENARIOS).map(([name, s]) => [name, makeGroups(s.seed, s.spec)]),
) as Record<string, GroupValues[]>;
const values = (name: string) => (data[name] as GroupValues[]).map((g) => g.values);

const tukeyCases = Object.keys(data).map((name) => ({ name, alpha: name === "tiny" ? 0.1 : 0.05 }));
const ghCases = ["balanced", "unequalVar", "skewed", "tiny"].map((name) => ({ name, alpha: 0.05 }));
const dunnCases: { name: string; adjust: Exclude<PAdjustMethod, "none"> }[] = [
  { name: "skewed", adjust: "holm" },
  { name: "ties", adjust: "holm" },
  { name: "ties", adjust: "bh" },
  { name: "balanced", adjust: "bonferroni" },
  { name: "tiny", adjust: "holm" },
  { name: "many", adjust: "bh" },
];
const welchCases = ["unequalVar", "balanced", "unequalN"].map((name) => ({ name, control: 0 }));

// Seeded p-value families: uniform, some tiny, some tied, exact 0 and 1.
const pRng = makeRng(808);
const pFamilies: number[][] = [[0.02], [0.04, 0.01], [0.01, 0.04, 0.03, 0.03, 0.5], [0, 1, 0.2, 0.2, 1e-12]];
for (const m of [7, 20]) {
  pFamilies.push(
    Array.from({ length: m }, () => Math.abs(standardNormal(pRng)) ** 4 / 50).map((p) => Math.min(1, p)),
  );
}
const methods: Exclude<PAdjustMethod, "none">[] = ["holm", "bonferroni", "bh"];
const pCases = pFamilies.flatMap((p) => methods.map((method) => ({ p, method })));

const hedgesCases = [
  { name: "unequalN", i: 0, j: 3 },
  { name: "unequalVar", i: 1, j: 2 },
  { name: "tiny", i: 0, j: 1 },
];

interface Reference {
  versions: { scipy: string; statsmodels: string; numpy: string };
  tukey: { statistic: number[][]; pvalue: number[][]; low: number[][]; high: number[][] }[];
  gamesHowell: {
    diff: number;
    se: number;
    df: number;
    q: number;
    p: number;
    lower: number;
    upper: number;
  }[][];
  dunn: { meanRanks: number[]; pairs: { z: number; p: number; pAdj: number; u: number; r: number }[] }[];
  welchControl: { t: number; p: number; df: number; pAdj: number }[][];
  padjust: number[][];
  hedges: { d: number; g: number }[];
}

const ref = runPython<Reference>("posthoc_runner.py", {
  tukey: tukeyCases.map((c) => ({ groups: values(c.name), alpha: c.alpha })),
  gamesHowell: ghCases.map((c) => ({ groups: values(c.name), alpha: c.alpha })),
  dunn: dunnCases.map((c) => ({ groups: values(c.name), adjust: c.adjust })),
  welchControl: welchCases.map((c) => ({ groups: values(c.name), control: c.control })),
  padjust: pCases,
  hedges: hedgesCases.map((c) => ({ a: values(c.name)[c.i], b: values(c.name)[c.j] })),
});

const rel = (x: number, y: number) => Math.abs(x - y) / Math.max(Math.abs(y), 1e-300);
const worstOf: Record<string, number> = {};
function track(label: string, err: number): number {
  worstOf[label] = Math.max(worstOf[label] ?? 0, err);
  return err;
}

describe(`post-hoc methods vs scipy ${ref.versions.scipy} / statsmodels ${ref.versions.statsmodels}`, () => {
  it.each(tukeyCases.map((c, i) => [c.name, c, i] as const))(
    "Tukey–Kramer (%s) matches scipy.stats.tukey_hsd statistic, pvalue and confidence_interval",
    (_name, c, idx) => {
      const summaries = summarize(data[c.name] as GroupValues[]);
      const { msWithin: ms, dfWithin } = msWithin(summaries);
      const res = tukeyKramer(summaries, ms, dfWithin, c.alpha);
      if (!res.available) throw new Error(res.reason);
      const r = ref.tukey[idx]!;
      const k = summaries.length;
      let p = 0;
      for (let i = 0; i < k; i++) {
        for (let j = i + 1; j < k; j++) {
          const pair = res.pairs[p++]!;
          // scipy: statistic[i][j] = mean_i − mean_j, the same sign as our diff = mean_a − mean_b.
          expect(track("tukey diff (rel)", rel(pair.diff, r.statistic[i]![j]!))).toBeLessThan(1e-9);
          expect(track("tukey p (abs)", Math.abs(pair.pAdj - r.pvalue[i]![j]!))).toBeLessThan(1e-8);
          const scale = Math.abs(pair.diff) + pair.se;
          expect(
            track("tukey CI (rel to |diff|+se)", Math.abs(pair.lower - r.low[i]![j]!) / scale),
          ).toBeLessThan(1e-9);
          expect(
            track("tukey CI (rel to |diff|+se)", Math.abs(pair.upper - r.high[i]![j]!) / scale),
          ).toBeLessThan(1e-9);
        }
      }
    },
  );

  it.each(ghCases.map((c, i) => [c.name, c, i] as const))(
    "Games–Howell (%s) matches the published formula built on scipy.stats.studentized_range",
    (_name, c, idx) => {
      const res = gamesHowell(summarize(data[c.name] as GroupValues[]), c.alpha);
      ref.gamesHowell[idx]!.forEach((r, i) => {
        const pair = res.pairs[i]!;
        if (!pair.available) throw new Error(pair.reason);
        expect(track("games-howell q (rel)", rel(pair.q, r.q))).toBeLessThan(1e-9);
        expect(track("games-howell df (rel)", rel(pair.df, r.df))).toBeLessThan(1e-9);
        expect(track("games-howell p (abs)", Math.abs(pair.pAdj - r.p))).toBeLessThan(1e-8);
        expect(track("games-howell CI (rel)", rel(pair.lower, r.lower))).toBeLessThan(1e-8);
        expect(track("games-howell CI (rel)", rel(pair.upper, r.upper))).toBeLessThan(1e-8);
      });
    },
  );

  it.each(dunnCases.map((c, i) => [`${c.name}, ${c.adjust}`, c, i] as const))(
    "Dunn (%s) matches scipy rankdata/norm.sf + statsmodels multipletests; rank-biserial from scipy mannwhitneyu U",
    (_name, c, idx) => {
      const res = dunn(data[c.name] as GroupValues[], c.adjust);
      if (!res.available) throw new Error(res.reason);
      const r = ref.dunn[idx]!;
      r.pairs.forEach((rp, i) => {
        const pair = res.pairs[i]!;
        expect(track("dunn z (rel)", rel(pair.z, rp.z))).toBeLessThan(1e-9);
        expect(track("dunn p (rel)", rel(pair.p, rp.p))).toBeLessThan(1e-9);
        expect(track("dunn pAdj (rel)", rel(pair.pAdj, rp.pAdj))).toBeLessThan(1e-9);
        if (!pair.rankBiserial.available) throw new Error(pair.rankBiserial.reason);
        expect(pair.rankBiserial.u).toBe(rp.u);
        expect(track("rank-biserial r (abs)", Math.abs(pair.rankBiserial.r - rp.r))).toBeLessThan(1e-12);
      });
    },
  );

  it.each(welchCases.map((c, i) => [c.name, c, i] as const))(
    "Welch vs control + Holm (%s) matches scipy ttest_ind(equal_var=False) + statsmodels multipletests('holm')",
    (_name, c, idx) => {
      const summaries = summarize(data[c.name] as GroupValues[]);
      const res = welchVsControlHolm(summaries, summaries[c.control]!.name);
      ref.welchControl[idx]!.forEach((r, i) => {
        const pair = res.pairs[i]!;
        if (!pair.available) throw new Error(pair.reason);
        expect(track("welch-vs-control t (rel)", rel(pair.t, r.t))).toBeLessThan(1e-9);
        expect(track("welch-vs-control df (rel)", rel(pair.df, r.df))).toBeLessThan(1e-9);
        expect(track("welch-vs-control p (rel)", rel(pair.p, r.p))).toBeLessThan(1e-8);
        expect(track("welch-vs-control pAdj (rel)", rel(pair.pAdj, r.pAdj))).toBeLessThan(1e-8);
      });
    },
  );

  it("adjustPValues matches statsmodels multipletests (holm, bonferroni, fdr_bh) exactly up to rounding", () => {
    pCases.forEach((c, i) => {
      const ours = adjustPValues(c.p, c.method);
      ours.forEach((v, j) =>
        expect(track("p-adjust (abs)", Math.abs(v - ref.padjust[i]![j]!))).toBeLessThan(1e-15),
      );
    });
  });

  it("Hedges' g matches the formula with scipy.special.gammaln for J", () => {
    hedgesCases.forEach((c, i) => {
      const s = summarize(data[c.name] as GroupValues[]);
      const g = hedgesG(s[c.i]!, s[c.j]!);
      if (!g.available) throw new Error(g.reason);
      expect(track("hedges g (rel)", rel(g.g, ref.hedges[i]!.g))).toBeLessThan(1e-9);
      expect(track("hedges d (rel)", rel(g.d, ref.hedges[i]!.d))).toBeLessThan(1e-9);
    });
  });
});

describe("Dunnett's test: published table values and Monte-Carlo", () => {
  const equal = (m: number) => new Array<number>(m).fill(Math.SQRT1_2);

  it("two-sided 5% critical values agree with Dunnett's (1955/1964) tables to their 2 decimals (from memory)", () => {
    // Equal n, m treatments vs control; values as printed in the two-sided table, from memory.
    const table: [number, number, number][] = [
      [Infinity, 2, 2.21],
      [Infinity, 4, 2.44],
      [Infinity, 9, 2.69],
      [10, 2, 2.57],
      [10, 5, 2.99],
      [20, 3, 2.54],
    ];
    for (const [df, m, c] of table)
      expect(Math.abs(dunnettQuantile(0.95, equal(m), df) - c)).toBeLessThan(0.006);
  });

  it("one comparison reduces to Student's t exactly (common practice identity)", () => {
    // m = 1: P(|T| > c) must not depend on λ.
    expect(Math.abs(dunnettSf(2.3, [0.3], 12) - dunnettSf(2.3, [0.9], 12))).toBeLessThan(1e-12);
  });

  it("unequal n: the simulated family-wise error at the critical value is α within 3.5 standard errors", () => {
    // Seeded simulation of the statistic itself: control n0 = 8, groups 5, 12, 20; df = 12.
    const n0 = 8;
    const ns = [5, 12, 20];
    const df = 12;
    const lambdas = ns.map((n) => Math.sqrt(n / (n + n0)));
    const c = dunnettQuantile(0.95, lambdas, df);
    const c2 = 1.9;
    const p2 = dunnettSf(c2, lambdas, df);
    const rng = makeRng(909);
    const runs = 40_000;
    let beyond = 0;
    let beyond2 = 0;
    for (let r = 0; r < runs; r++) {
      const y0 = standardNormal(rng) / Math.sqrt(n0);
      let chi = 0;
      for (let d = 0; d < df; d++) chi += standardNormal(rng) ** 2;
      const s = Math.sqrt(chi / df);
      let max = 0;
      for (const n of ns) {
        const t = (standardNormal(rng) / Math.sqrt(n) - y0) / (s * Math.sqrt(1 / n + 1 / n0));
        max = Math.max(max, Math.abs(t));
      }
      if (max > c) beyond++;
      if (max > c2) beyond2++;
    }
    const se = (p: number) => Math.sqrt((p * (1 - p)) / runs);
    expect(Math.abs(beyond / runs - 0.05)).toBeLessThan(3.5 * se(0.05));
    expect(Math.abs(beyond2 / runs - p2)).toBeLessThan(3.5 * se(p2));
  });

  it("dunnettTest: simultaneous intervals use the critical value and contain the difference", () => {
    const s = summarize(data.unequalN as GroupValues[]);
    const res = dunnettTest(s, "A");
    if (!res.available) throw new Error(res.reason);
    for (const p of res.pairs) {
      expect(p.lower).toBeLessThan(p.diff);
      expect(p.upper).toBeGreaterThan(p.diff);
      expect(Math.abs(p.upper - p.diff - res.criticalT * p.se)).toBeLessThan(1e-12 * (1 + Math.abs(p.diff)));
    }
  });
});

describe("worst errors measured", () => {
  it("prints them", () => {
    console.log(JSON.stringify(worstOf, null, 1));
  });
});
