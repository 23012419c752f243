/**
 * Neumaier's compensated sum (improved Kahan–Babuška summation): carries the rounding error
 * of every addition in a second accumulator, so the result is as if summed in about twice
 * the precision, whatever the order and magnitudes.
 * Reference: Neumaier, A. (1974). Rundungsfehleranalyse einiger Verfahren zur Summation
 * endlicher Summen. ZAMM 54, 39–51.
 * Example: neumaierSum([1, 1e100, 1, -1e100]) → 2 (a plain loop gives 0).
 * Cost: O(n), about four flops per term.
 */
export function neumaierSum(values: ArrayLike<number>): number {
  let sum = 0;
  let c = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    const t = sum + v;
    c += Math.abs(sum) >= Math.abs(v) ? sum - t + v : v - t + sum;
    sum = t;
  }
  return sum + c;
}
