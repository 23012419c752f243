import { StatsInputError } from "../errors.js";
import { anovaPower } from "./anova-power.js";

/**
 * Power of the one-way ANOVA over a range of equal group sizes, for plotting.
 *
 * In words: anovaPower at n = nMin, nMin + step, …, up to nMax (inclusive when reached).
 * Reference: as anovaPower (Cohen 1988, ch. 8).
 * Example: powerCurve({ k: 3, f: 0.25, nMin: 10, nMax: 60, step: 10 }) → six points.
 * Cost: one power evaluation per point.
 */
export function powerCurve(input: {
  k: number;
  f: number;
  alpha?: number;
  nMin?: number;
  nMax: number;
  step?: number;
}): { n: number; power: number }[] {
  const nMin = input.nMin ?? 2;
  const step = input.step ?? 1;
  if (!Number.isInteger(step) || step < 1)
    throw new StatsInputError(`A power curve needs a whole step of at least 1; got ${step}`);
  if (!(input.nMax >= nMin))
    throw new StatsInputError(`A power curve needs nMax ≥ nMin; got ${input.nMax} and ${nMin}`);
  if ((input.nMax - nMin) / step > 10_000)
    throw new StatsInputError("A power curve is limited to 10 000 points");
  const points: { n: number; power: number }[] = [];
  for (let n = nMin; n <= input.nMax; n += step) {
    points.push({
      n,
      power: anovaPower({ k: input.k, nPerGroup: n, f: input.f, alpha: input.alpha ?? 0.05 }).power,
    });
  }
  return points;
}
