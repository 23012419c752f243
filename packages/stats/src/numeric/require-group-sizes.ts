import { StatsInputError } from "../errors.js";
import type { CentredSample } from "./centred-sample.js";

/**
 * Checks the design a method needs — at least `minGroups` groups and `minPerGroup` values in
 * every group — and throws StatsInputError in the engine's one message pattern otherwise,
 * e.g. "Welch's ANOVA needs at least two values in every group; group 'B' has 1".
 * Cost: O(k).
 */
export function requireGroupSizes(
  sample: CentredSample,
  method: string,
  minPerGroup: number,
  minGroups = 2,
): void {
  const k = sample.groups.length;
  if (k < minGroups) {
    throw new StatsInputError(`${method} needs at least ${numberWord(minGroups)} groups; found ${k}`);
  }
  for (const g of sample.groups) {
    if (g.centred.length < minPerGroup) {
      throw new StatsInputError(
        `${method} needs at least ${numberWord(minPerGroup)} value${minPerGroup === 1 ? "" : "s"} in every group; group '${g.name}' has ${g.centred.length}`,
      );
    }
  }
}

function numberWord(n: number): string {
  return ["zero", "one", "two", "three", "four", "five"][n] ?? String(n);
}
