import { StatsInputError } from "../errors.js";
import { anovaPower } from "../planning/anova-power.js";
import { anovaSampleSize } from "../planning/anova-sample-size.js";
import { CliError } from "./cli-error.js";

export interface PowerArgs {
  k: number;
  f: number;
  alpha: number;
  n?: number;
  power?: number;
  json: boolean;
}

/**
 * `waymark-stats power`: the power of the classic one-way ANOVA F test for k groups of n
 * (noncentral F with λ = N·f², Cohen's f), or the smallest n per group reaching a target
 * power. Prints one JSON object with --json, else a short sentence block.
 * Example: powerCommand({ k: 3, f: 0.4, alpha: 0.05, power: 0.8, json: true }).
 * Cost: a few noncentral F tails (a bisection over n for the sample size).
 */
export function powerCommand(args: PowerArgs): string {
  try {
    if (args.n !== undefined) {
      const r = anovaPower({ k: args.k, nPerGroup: args.n, f: args.f, alpha: args.alpha });
      const out = {
        mode: "power",
        k: args.k,
        f: args.f,
        alpha: args.alpha,
        nPerGroup: args.n,
        totalN: r.totalN,
        power: r.power,
        lambda: r.lambda,
        df1: r.df1,
        df2: r.df2,
        criticalF: r.criticalF,
      };
      if (args.json) return JSON.stringify(out) + "\n";
      return `Power of the one-way ANOVA F test\n  ${args.k} groups of ${args.n} (N = ${r.totalN}), Cohen's f = ${args.f}, α = ${args.alpha}\n  power = ${r.power.toFixed(4)} (noncentrality λ = ${r.lambda.toFixed(3)}, critical F = ${r.criticalF.toFixed(4)} on ${r.df1} and ${r.df2} df)\n`;
    }
    const target = args.power as number;
    const s = anovaSampleSize({ k: args.k, f: args.f, alpha: args.alpha, power: target });
    const r = anovaPower({ k: args.k, nPerGroup: s.nPerGroup, f: args.f, alpha: args.alpha });
    const out = {
      mode: "sample-size",
      k: args.k,
      f: args.f,
      alpha: args.alpha,
      targetPower: target,
      nPerGroup: s.nPerGroup,
      totalN: s.totalN,
      power: s.achievedPower,
      lambda: r.lambda,
      df1: r.df1,
      df2: r.df2,
      criticalF: r.criticalF,
    };
    if (args.json) return JSON.stringify(out) + "\n";
    return `Sample size for the one-way ANOVA F test\n  ${args.k} groups, Cohen's f = ${args.f}, α = ${args.alpha}, target power ${target}\n  ${s.nPerGroup} per group (N = ${s.totalN}) gives power ${s.achievedPower.toFixed(4)}\n`;
  } catch (e) {
    if (e instanceof StatsInputError)
      throw new CliError(e.message.charAt(0).toLowerCase() + e.message.slice(1));
    throw e;
  }
}
