import type { HedgesG } from "../effect-sizes/hedges-g.js";

/** One group compared with the control: a = the group, b = the control, diff = mean_a − mean_b. */
export interface ControlComparisonPair {
  a: string;
  b: string;
  diff: number;
  se: number;
  t: number;
  df: number;
  pAdj: number;
  hedgesG: HedgesG;
}

/** Dunnett adds simultaneous 1 − α limits for mean_a − mean_control. */
export interface DunnettPair extends ControlComparisonPair {
  lower: number;
  upper: number;
}
