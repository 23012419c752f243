import type { OmnibusTest, PowerMethod } from "../vocabulary/ids.js";
import { StatsInputError } from "../errors.js";
import { anovaSampleSize } from "./anova-sample-size.js";
import { simulatedPower } from "./simulated-power.js";

export interface PlanPowerResult {
  test: OmnibusTest;
  method: PowerMethod;
  nPerGroup: number;
  /** Power at nPerGroup: exact for classic ANOVA, the same figure as an approximation for Welch, simulated (± standardError) for Kruskal–Wallis. */
  achievedPower: number;
  standardError: number | null;
  seed: number | null;
  note: string;
}

/** Equally spaced means with SD 1 whose spread gives Cohen's f: f² = Σ(μᵢ − μ̄)²/k (Cohen 1988). */
export function meansForEffectF(k: number, f: number): number[] {
  const raw = Array.from({ length: k }, (_, i) => i - (k - 1) / 2);
  const spread = Math.sqrt(raw.reduce((s, x) => s + x * x, 0) / k);
  return raw.map((x) => (x * f) / spread);
}

/**
 * Sample size per group for the plan's primary test.
 * - Classic ANOVA: the noncentral F (Cohen 1988; Lenth 1987, AS 226).
 * - Welch's ANOVA: the same noncentral F figure, flagged as an approximation (exact with equal
 *   spreads and sizes; no closed form otherwise).
 * - Kruskal–Wallis: starts from the F answer inflated by the asymptotic relative efficiency
 *   under normality, π/3 (Andrews 1954, Annals of Mathematical Statistics 25, 724–736, from
 *   memory), then checks the power by a seeded simulation of normal groups with equally spaced
 *   means at Cohen's f, stepping n up until the target is met.
 * Example: planPower({ test: "welch", k: 4, f: 0.25, alpha: 0.05, power: 0.8 }).nPerGroup → 45.
 * Cost: closed form for the F tests; for Kruskal–Wallis one or a few simulations of `runs` studies.
 */
export function planPower(input: {
  test: OmnibusTest;
  k: number;
  f: number;
  alpha: number;
  power: number;
  runs?: number;
  seed?: number;
}): PlanPowerResult {
  const f = anovaSampleSize({ k: input.k, f: input.f, alpha: input.alpha, power: input.power });
  if (input.test === "anova")
    return {
      test: "anova",
      method: "noncentral-f",
      nPerGroup: f.nPerGroup,
      achievedPower: f.achievedPower,
      standardError: null,
      seed: null,
      note: "Power of classic one-way ANOVA from the noncentral F distribution.",
    };
  if (input.test === "welch")
    return {
      test: "welch",
      method: "noncentral-f-welch-approximation",
      nPerGroup: f.nPerGroup,
      achievedPower: f.achievedPower,
      standardError: null,
      seed: null,
      note: "Power of Welch's ANOVA approximated by the noncentral F of classic ANOVA: close with equal spreads and sizes, optimistic when the groups with the larger spread are smaller.",
    };
  const runs = input.runs ?? 1000;
  const seed = input.seed ?? 1;
  if (input.k * f.nPerGroup > 20_000) {
    throw new StatsInputError(
      `Simulated power for the Kruskal–Wallis test is limited to 20,000 values in all; f = ${input.f} needs about ${f.nPerGroup} per group. Plan a larger effect or use the F-test figure as a guide.`,
    );
  }
  const means = meansForEffectF(input.k, input.f);
  const sds = new Array<number>(input.k).fill(1);
  let n = Math.max(3, Math.ceil((f.nPerGroup * Math.PI) / 3));
  for (let step = 0; step < 6; step++) {
    const sim = simulatedPower({ means, sds, n, alpha: input.alpha, simulations: runs, seed });
    if (sim.kruskalWallis.power >= input.power || step === 5) {
      return {
        test: "kruskal-wallis",
        method: "simulation",
        nPerGroup: n,
        achievedPower: sim.kruskalWallis.power,
        standardError: sim.kruskalWallis.standardError,
        seed,
        note: `Power of the Kruskal–Wallis test from ${runs} simulated studies of normal groups (seed ${seed}); the figure has a Monte Carlo error of about ±${(2 * sim.kruskalWallis.standardError).toFixed(3)}.`,
      };
    }
    n = Math.ceil(n * 1.05) + 1;
  }
  throw new Error("unreachable");
}
