import { StatsInputError } from "../errors.js";
import type { GroupSummary } from "../types/group-summary.js";

/**
 * Shared input checks for the post-hoc methods that work from group summaries, so every
 * method words its errors the same way: "<method> needs …; group 'B' has 1".
 */
export function validateSummaries(method: string, groups: readonly GroupSummary[], minN: number): void {
  if (groups.length < 2) {
    throw new StatsInputError(`${method} needs at least two groups; got ${groups.length}`);
  }
  const seen = new Set<string>();
  for (const g of groups) {
    if (seen.has(g.name))
      throw new StatsInputError(`${method} needs distinct group names; '${g.name}' appears twice`);
    seen.add(g.name);
    if (!Number.isInteger(g.n) || g.n < minN) {
      throw new StatsInputError(
        `${method} needs at least ${minN === 1 ? "one value" : `${numberWord(minN)} values`} in every group; group '${g.name}' has ${g.n}`,
      );
    }
    if (!Number.isFinite(g.mean))
      throw new StatsInputError(
        `${method} needs a finite mean in every group; group '${g.name}' has ${g.mean}`,
      );
    if (!(g.variance >= 0) || !Number.isFinite(g.variance)) {
      throw new StatsInputError(
        `${method} needs a finite variance of 0 or more in every group; group '${g.name}' has ${g.variance}`,
      );
    }
  }
}

export function validateAlpha(method: string, alpha: number): void {
  if (!(alpha > 0 && alpha < 1))
    throw new StatsInputError(`${method} needs alpha between 0 and 1; got ${alpha}`);
}

function numberWord(n: number): string {
  return ["zero", "one", "two", "three", "four"][n] ?? String(n);
}
