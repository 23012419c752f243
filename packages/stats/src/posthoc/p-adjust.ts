import { StatsInputError } from "../errors.js";

import type { Adjustment } from "../vocabulary/ids.js";

export type PAdjustMethod = Adjustment | "none";

/**
 * Multiplicity adjustment of a family of m p-values.
 *
 * In words, with p₍₁₎ ≤ … ≤ p₍m₎ the sorted p-values:
 * - Bonferroni: p̃ᵢ = min(1, m·pᵢ).
 * - Holm (step-down): p̃₍ᵢ₎ = max over j ≤ i of min(1, (m − j + 1)·p₍ⱼ₎); controls the
 *   family-wise error rate like Bonferroni and is never less powerful.
 * - Benjamini–Hochberg (step-up): p̃₍ᵢ₎ = min over j ≥ i of min(1, m·p₍ⱼ₎/j); controls the
 *   false discovery rate for independent or positively dependent tests.
 * - none: the p-values unchanged.
 * Results are returned in the input order; the input array is never modified.
 *
 * Reference: Holm (1979), Scandinavian J. Statistics 6, 65–70; Benjamini & Hochberg (1995),
 * JRSS B 57, 289–300.
 * Example: adjustPValues([0.01, 0.04, 0.03], "holm") → [0.03, 0.06, 0.06].
 * Cost: O(m log m).
 */
export function adjustPValues(p: readonly number[], method: PAdjustMethod): number[] {
  for (const [i, v] of p.entries()) {
    if (!(v >= 0 && v <= 1)) {
      throw new StatsInputError(
        `Adjusting p-values needs every p-value between 0 and 1; p-value ${i + 1} is ${v}`,
      );
    }
  }
  const m = p.length;
  if (method === "none") return [...p];
  if (method === "bonferroni") return p.map((v) => Math.min(1, m * v));
  // Stable sort of indices by p-value: ties keep their input order.
  const order = p.map((_, i) => i).sort((i, j) => (p[i] as number) - (p[j] as number) || i - j);
  const out = new Array<number>(m);
  if (method === "holm") {
    let running = 0;
    order.forEach((idx, rank) => {
      running = Math.max(running, Math.min(1, (m - rank) * (p[idx] as number)));
      out[idx] = running;
    });
    return out;
  }
  if (method === "bh") {
    let running = 1;
    for (let rank = m - 1; rank >= 0; rank--) {
      const idx = order[rank] as number;
      running = Math.min(running, (m * (p[idx] as number)) / (rank + 1));
      out[idx] = running;
    }
    return out;
  }
  throw new StatsInputError(
    `Adjusting p-values needs the method "holm", "bonferroni", "bh" or "none"; got "${String(method)}"`,
  );
}
