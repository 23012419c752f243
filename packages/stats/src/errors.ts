/**
 * Thrown when input data cannot be analysed at all (too few groups, non-numeric text, ...).
 * Messages follow one pattern: what the method needs, then what was found,
 * e.g. "Welch's ANOVA needs at least two values in every group; group 'B' has 1".
 */
export class StatsInputError extends Error {
  override readonly name = "StatsInputError";
}
