import { describe, expect, it } from "vitest";
import { meansForEffectF, planPower } from "./plan-power.js";

describe("planPower follows the primary test", () => {
  it("gives classic ANOVA the noncentral-F size: k = 4, f = .25, power .80 → 45 per group", () => {
    // statsmodels 0.13.5 FTestAnovaPower.solve_power(effect_size=0.25, k_groups=4, power=0.8) = 178.4 in all,
    // 44.6 per group, rounded up to 45 (recorded in the project's STACK notes).
    expect(planPower({ test: "anova", k: 4, f: 0.25, alpha: 0.05, power: 0.8 })).toMatchObject({
      method: "noncentral-f",
      nPerGroup: 45,
    });
  });

  it("flags the same figure as an approximation for Welch's ANOVA", () => {
    const w = planPower({ test: "welch", k: 4, f: 0.25, alpha: 0.05, power: 0.8 });
    expect(w).toMatchObject({ method: "noncentral-f-welch-approximation", nPerGroup: 45 });
    expect(w.note).toMatch(/approximat/);
  });

  it("simulates Kruskal–Wallis, needing more per group than the F test, and reaches the target", () => {
    const kw = planPower({
      test: "kruskal-wallis",
      k: 3,
      f: 0.4,
      alpha: 0.05,
      power: 0.8,
      runs: 400,
      seed: 7,
    });
    const f = planPower({ test: "anova", k: 3, f: 0.4, alpha: 0.05, power: 0.8 });
    expect(kw.method).toBe("simulation");
    expect(kw.nPerGroup).toBeGreaterThan(f.nPerGroup);
    expect(kw.achievedPower).toBeGreaterThanOrEqual(0.8);
    expect(kw.seed).toBe(7);
  });

  it("builds means whose spread is Cohen's f (definition: f² = Σ(μᵢ − μ̄)²/k, SD 1)", () => {
    const m = meansForEffectF(5, 0.3);
    const mean = m.reduce((a, b) => a + b, 0) / 5;
    expect(Math.sqrt(m.reduce((s, x) => s + (x - mean) ** 2, 0) / 5)).toBeCloseTo(0.3, 12);
  });
});
