/** Both samples below this size and no ties: the exact null distribution is used (as R's wilcox.test does). */
export const MANN_WHITNEY_EXACT_BELOW = 50;

const cache = new Map<string, Float64Array>();

/**
 * Lower tail of the exact null distribution of the Mann–Whitney U = #{x_i > y_j} for
 * samples of n and m values without ties: P(U ≤ u) for u = 0 … ⌊nm/2⌋.
 *
 * In words: under the null every ordering of the n + m values is equally likely. The
 * largest value is an x with probability n/(n + m), and then it exceeds all m y's, so
 * p_{n,m}(u) = n/(n+m)·p_{n−1,m}(u − m) + m/(n+m)·p_{n,m−1}(u), with p_{0,m} and p_{n,0}
 * putting all mass on u = 0. Probabilities (not counts) are carried, so nothing overflows;
 * every term is non-negative, so nothing cancels.
 *
 * Reference: Mann & Whitney (1947), Annals of Mathematical Statistics 18, 50–60.
 * Example: n = m = 2 → P(U = 0) = P(U = 1) = 1/6, P(U = 2) = 2/6; the lower tail
 * [1/6, 2/6, 4/6].
 * Cost: O(n·m·nm/2) time, O(m·nm/2) memory; cached by (n, m).
 */
export function mannWhitneyLowerTail(n: number, m: number): Float64Array {
  const key = n <= m ? `${n},${m}` : `${m},${n}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const [a, b] = n <= m ? [n, m] : [m, n]; // U's distribution is symmetric in the roles
  const top = Math.floor((a * b) / 2);
  // prev[j] = distribution for (i − 1, j); cur[j] for (i, j); truncated at u = top.
  const unit = () => {
    const d = new Float64Array(top + 1);
    d[0] = 1;
    return d;
  };
  let prev: Float64Array[] = Array.from({ length: b + 1 }, unit); // i = 0
  for (let i = 1; i <= a; i++) {
    const cur: Float64Array[] = [unit()]; // j = 0
    for (let j = 1; j <= b; j++) {
      const d = new Float64Array(top + 1);
      const px = i / (i + j);
      const py = j / (i + j);
      const fromX = prev[j] as Float64Array;
      const fromY = cur[j - 1] as Float64Array;
      for (let u = 0; u <= top; u++)
        d[u] = py * (fromY[u] as number) + (u >= j ? px * (fromX[u - j] as number) : 0);
      cur.push(d);
    }
    prev = cur;
  }
  const density = prev[b] as Float64Array;
  const tail = new Float64Array(top + 1);
  let s = 0;
  for (let u = 0; u <= top; u++) {
    s += density[u] as number;
    tail[u] = s;
  }
  cache.set(key, tail);
  return tail;
}
