import { describe, expect, it } from "vitest";
import { runPython } from "./python.js";
import { anovaPower } from "../../packages/stats/src/planning/anova-power.js";
import { anovaSampleSize } from "../../packages/stats/src/planning/anova-sample-size.js";
import { familyWiseError } from "../../packages/stats/src/planning/family-wise-error.js";
import { etaSquaredCi } from "../../packages/stats/src/effect-sizes/eta-squared-ci.js";

/**
 * Planning functions against statsmodels 0.13.5 (FTestAnovaPower, whose nobs is the total
 * N) and the η² interval against scipy 1.10.1 (brentq on ncf.cdf), via
 * tests/reference/python/planning_runner.py; plus Cohen's (1988) table value from memory.
 */

const powerCases: { k: number; n: number | number[]; f: number; alpha: number }[] = [];
for (const k of [2, 3, 4, 6, 10])
  for (const n of [5, 20, 60]) for (const f of [0.1, 0.25, 0.4]) powerCases.push({ k, n, f, alpha: 0.05 });
powerCases.push({ k: 3, n: 15, f: 0.3, alpha: 0.01 }, { k: 5, n: 200, f: 0.5, alpha: 0.001 });
// Unequal allocation: with λ = N·f² and df2 = N − k, only the total enters.
powerCases.push(
  { k: 3, n: [10, 20, 30], f: 0.3, alpha: 0.05 },
  { k: 4, n: [5, 5, 8, 40], f: 0.25, alpha: 0.05 },
);
const totalOf = (c: { k: number; n: number | number[] }) =>
  typeof c.n === "number" ? c.n * c.k : c.n.reduce((s, x) => s + x, 0);

const solveCases = [
  { k: 4, f: 0.25, alpha: 0.05, power: 0.8 },
  { k: 3, f: 0.1, alpha: 0.05, power: 0.9 },
  { k: 2, f: 0.4, alpha: 0.01, power: 0.8 },
  { k: 8, f: 0.25, alpha: 0.05, power: 0.95 },
];

const etaCases = [
  { F: 5, df1: 3, df2: 36, level: 0.95 },
  { F: 0.8, df1: 2, df2: 27, level: 0.95 },
  { F: 25, df1: 4, df2: 200, level: 0.9 },
  { F: 2.2, df1: 9, df2: 90, level: 0.99 },
  { F: 120, df1: 2, df2: 5000, level: 0.95 },
];

interface Reference {
  versions: { scipy: string; statsmodels: string };
  power: number[];
  solve: number[];
  etaCi: { lower: number; upper: number; lambdaLower: number; lambdaUpper: number }[];
}

const ref = runPython<Reference>("planning_runner.py", {
  power: powerCases.map((c) => ({ k: c.k, nobs: totalOf(c), f: c.f, alpha: c.alpha })),
  solve: solveCases,
  etaCi: etaCases,
});

describe(`ANOVA power vs statsmodels ${ref.versions.statsmodels} FTestAnovaPower`, () => {
  it("power matches FTestAnovaPower().power(effect_size, nobs = total N, alpha, k_groups) within 1e-9", () => {
    let worst = 0;
    powerCases.forEach((c, i) => {
      const ours = anovaPower({ k: c.k, nPerGroup: c.n, f: c.f, alpha: c.alpha }).power;
      worst = Math.max(worst, Math.abs(ours - ref.power[i]!));
    });
    console.log(`anova power vs statsmodels: worst abs ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-9);
  });

  it("sample size is the ceiling of solve_power's total nobs / k, and the power straddles the target", () => {
    solveCases.forEach((c, i) => {
      const ours = anovaSampleSize(c);
      expect(ours.nPerGroup).toBe(Math.ceil(ref.solve[i]! / c.k));
      expect(ours.achievedPower).toBeGreaterThanOrEqual(c.power);
      expect(
        anovaPower({ k: c.k, nPerGroup: ours.nPerGroup - 1, f: c.f, alpha: c.alpha }).power,
      ).toBeLessThan(c.power);
    });
  });

  it("k = 4, f = 0.25, α = .05, power .80 → n = 45 per group (Cohen 1988, Table 8.4.4, from memory)", () => {
    expect(anovaSampleSize({ k: 4, f: 0.25, alpha: 0.05, power: 0.8 }).nPerGroup).toBe(45);
  });
});

describe(`η² confidence interval vs scipy ${ref.versions.scipy} (brentq on ncf.cdf)`, () => {
  it("bounds match within 1e-7 relative (λ within 1e-7 relative)", () => {
    let worst = 0;
    etaCases.forEach((c, i) => {
      const ours = etaSquaredCi(c.F, c.df1, c.df2, c.level);
      if (!ours.available) throw new Error(ours.reason);
      const r = ref.etaCi[i]!;
      for (const [a, b] of [
        [ours.lower, r.lower],
        [ours.upper, r.upper],
      ] as const) {
        const err = b === 0 ? Math.abs(a) : Math.abs(a - b) / b;
        worst = Math.max(worst, err);
      }
    });
    console.log(`eta² CI vs scipy: worst rel ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-7);
  });
});

describe("family-wise error", () => {
  it("k = 7 → m = 21 and FWER 1 − 0.95²¹ ≈ 0.6594 (common practice, textbook formula)", () => {
    const r = familyWiseError({ k: 7, alpha: 0.05 });
    expect(r.m).toBe(21);
    expect(r.fwerIndependent).toBeCloseTo(0.6594, 4);
  });
});
