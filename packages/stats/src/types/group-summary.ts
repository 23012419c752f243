/** Raw values of one group, as the engine receives them. */
export interface GroupValues {
  name: string;
  values: number[];
}

/** The per-group summary that post-hoc methods work from (variance with n − 1 denominator). */
export interface GroupSummary {
  name: string;
  n: number;
  mean: number;
  variance: number;
}

/** A result that could not be computed, with the reason in plain words. */
export interface Unavailable {
  available: false;
  reason: string;
}
