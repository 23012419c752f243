/**
 * The r-th smallest (1-based) of the n·m differences x_i − y_j of two ascending samples,
 * without forming them.
 *
 * In words: Floyd–Rivest style selection on the implicit sorted matrix. A bracket (lo, hi]
 * holding the answer is kept with, for every x_i, the range of y's whose differences fall
 * inside it (a count of differences ≤ d takes one two-pointer pass, O(n + m), because for
 * ascending x the qualifying y's form a suffix whose start only moves right). Each round
 * draws a fixed-seed sample of the differences inside the bracket, takes two sample order
 * statistics just below and above the target's expected position as the new bracket, and
 * keeps each side only if its count confirms it; once the bracket holds at most max(4096, (n + m)/64)
 * differences they are listed and the one needed is picked. A round that makes no progress
 * (heavy ties) checks whether the next distinct difference below hi falls short of r (then hi is the
 * answer) and otherwise moves hi down to it. Differences are compared exactly as computed
 * (x_i − y_j in doubles), so the result is one of the n·m differences, the same as sorting
 * them all; the sampling only changes the speed.
 *
 * Reference: Floyd & Rivest (1975), Communications of the ACM 18, 165–172 (selection by
 * sampling); Johnson & Mizoguchi (1978), SIAM J. Computing 7, 147–153 (selection in X + Y;
 * both from memory).
 * Example: x = [1, 4], y = [0, 2] → differences −1, 1, 2, 4; r = 2 gives 1.
 * Cost: O(n + m) per round, a handful of rounds (each shrinks the bracket about 40-fold).
 */
export function pairwiseDifferenceOrder(x: Float64Array, y: Float64Array, r: number): number {
  const n = x.length;
  const m = y.length;
  let lo = (x[0] as number) - (y[m - 1] as number);
  let hi = (x[n - 1] as number) - (y[0] as number);
  const startHi = new Int32Array(n); // first j with x_i − y_j ≤ hi
  const startLo = new Int32Array(n); // first j with x_i − y_j ≤ lo
  const scratch = new Int32Array(n);
  let below = countAtMost(x, y, lo, startLo);
  if (r <= below) return lo; // r = 1, or the smallest difference repeated
  let upTo = countAtMost(x, y, hi, startHi);
  // Listing and sorting is the costly step; a few more cheap rounds keep the list short.
  const budget = Math.max(4096, (n + m) >> 6);
  const prefix = new Float64Array(n + 1);
  const SAMPLE = 8192;
  let seed = 0x2545f491;
  const uniform = () => {
    // xorshift32: a fixed sequence, so runs are reproducible
    seed ^= seed << 13;
    seed ^= seed >>> 17;
    seed ^= seed << 5;
    return (seed >>> 0) / 4294967296;
  };
  while (upTo - below > budget) {
    const active = upTo - below;
    for (let i = 0; i < n; i++)
      prefix[i + 1] = (prefix[i] as number) + ((startLo[i] as number) - (startHi[i] as number));
    const s = Math.min(SAMPLE, active);
    const sample = new Float64Array(s);
    for (let t = 0; t < s; t++) {
      const u = uniform() * active;
      let a = 0;
      let b = n; // row i with prefix[i] ≤ u < prefix[i + 1]
      while (b - a > 1) {
        const mid = (a + b) >>> 1;
        if ((prefix[mid] as number) <= u) a = mid;
        else b = mid;
      }
      const j = (startHi[a] as number) + Math.floor(u - (prefix[a] as number));
      sample[t] = (x[a] as number) - (y[Math.min(j, (startLo[a] as number) - 1)] as number);
    }
    sample.sort();
    const q = (r - below) / active;
    const spread = 3 * Math.sqrt(q * (1 - q) * s) + 2;
    const loCand = sample[Math.max(0, Math.floor(q * s - spread))] as number;
    const hiCand = sample[Math.min(s - 1, Math.ceil(q * s + spread))] as number;
    let progressed = false;
    if (hiCand < hi) {
      const c = countAtMost(x, y, hiCand, scratch);
      if (c >= r) {
        hi = hiCand;
        upTo = c;
        startHi.set(scratch);
        progressed = true;
      }
    }
    if (loCand > lo && loCand < hi) {
      const c = countAtMost(x, y, loCand, scratch);
      if (c < r) {
        lo = loCand;
        below = c;
        startLo.set(scratch);
        progressed = true;
      }
    }
    if (!progressed) {
      // Heavy ties: the sample sits on hi. If the next distinct difference below hi falls short
      // of r, hi is the answer; otherwise it becomes hi.
      const prev = largestBelow(x, y, hi);
      const c = countAtMost(x, y, prev, scratch);
      if (c < r) return hi;
      hi = prev;
      upTo = c;
      startHi.set(scratch);
    }
  }
  const inside = new Float64Array(upTo - below);
  let k = 0;
  for (let i = 0; i < n; i++) {
    const xi = x[i] as number;
    for (let j = startHi[i] as number; j < (startLo[i] as number); j++) inside[k++] = xi - (y[j] as number);
  }
  inside.sort();
  return inside[r - below - 1] as number;
}

/**
 * The (r + 1)-th smallest difference given the r-th, d_r: d_r again when it is repeated past
 * rank r, else the smallest difference above it. Two passes, O(n + m); the Hodges–Lehmann
 * median of an even count needs both middle ranks.
 */
export function pairwiseDifferenceAfter(x: Float64Array, y: Float64Array, r: number, dr: number): number {
  const atMost = countAtMost(x, y, dr, new Int32Array(x.length));
  return atMost >= r + 1 ? dr : smallestAbove(x, y, dr);
}

/** #{x_i − y_j ≤ d}; writes each row's first qualifying j into start. O(n + m). */
function countAtMost(x: Float64Array, y: Float64Array, d: number, start: Int32Array): number {
  const n = x.length;
  const m = y.length;
  let c = 0;
  let j = 0;
  for (let i = 0; i < n; i++) {
    const xi = x[i] as number;
    while (j < m && xi - (y[j] as number) > d) j++;
    start[i] = j;
    c += m - j;
  }
  return c;
}

/** The largest difference x_i − y_j less than d (two pointers, O(n + m)). */
function largestBelow(x: Float64Array, y: Float64Array, d: number): number {
  let best = -Infinity;
  let j = 0;
  // For ascending x the smallest y_j with x_i − y_j < d only moves right.
  for (let i = 0; i < x.length; i++) {
    const xi = x[i] as number;
    while (j < y.length && !(xi - (y[j] as number) < d)) j++;
    if (j === y.length) break;
    const v = xi - (y[j] as number);
    if (v > best) best = v;
  }
  return best;
}

/** The smallest difference x_i − y_j greater than d (two pointers, O(n + m)). */
function smallestAbove(x: Float64Array, y: Float64Array, d: number): number {
  let best = Infinity;
  let j = y.length - 1;
  // For descending x the largest y_j with x_i − y_j > d only moves down.
  for (let i = x.length - 1; i >= 0; i--) {
    const xi = x[i] as number;
    while (j >= 0 && !(xi - (y[j] as number) > d)) j--;
    if (j < 0) break;
    const v = xi - (y[j] as number);
    if (v < best) best = v;
  }
  return best;
}
