/**
 * Exact powers of ten 10^0 … 10^22 (every one is a double without rounding), so scaling a
 * safe integer by one of them is a single correctly rounded operation.
 */
export const POWERS_OF_TEN: readonly number[] = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));

/** 10^e for any integer e, exact for |e| ≤ 22 and correctly rounded beyond. */
export function powerOfTen(e: number): number {
  if (e >= 0 && e <= 22) return POWERS_OF_TEN[e] as number;
  return Number(`1e${e}`);
}
