/**
 * Narrow, defensive views of `analyze()` output for the reporting helpers: every part may be
 * Unavailable, so each accessor returns null instead of a half-read object.
 */
export interface UnavailablePart {
  available: false;
  reason: string;
}

export type Part<T> = T | UnavailablePart;

export function ok<T extends object>(x: Part<T> | undefined | null): x is T {
  return (
    !!x && typeof x === "object" && !("available" in x && (x as { available?: unknown }).available === false)
  );
}

export function reasonOf(x: unknown): string {
  return x && typeof x === "object" && "reason" in x
    ? String((x as { reason: unknown }).reason)
    : "it could not be computed";
}

export interface FTest {
  F: number;
  df1: number;
  df2: number;
  p: number;
}

export interface ResultView {
  groups: { name: string; n: number; mean: number; sd: number | UnavailablePart; median: number }[];
  anova: Part<
    FTest & {
      etaSquared: number;
      omegaSquared: number;
      etaSquaredCi?: { lower: number; upper: number } | UnavailablePart;
    }
  >;
  welch: Part<FTest>;
  kruskalWallis: Part<{ H: number; df: number; p: number; epsilonSquared: number }>;
  levene: Part<FTest>;
  brownForsythe: Part<FTest>;
  bartlett: Part<{ statistic: number; df: number; p: number }>;
  shapiroWilk: (
    | { group: string; n: number; W: number; p: number }
    | { group: string; n?: number; available: false; reason: string }
  )[];
  shapiroWilkResiduals: Part<{ W: number; p: number; n?: number }>;
  sdRatio: Part<{ ratio: number }> | number;
  outliers: Part<{
    totalMild: number;
    totalExtreme: number;
    totalLargeResidual: number;
    groups: {
      group: string;
      mild: { row: number; value: number }[];
      extreme: { row: number; value: number }[];
      largeResidual: { row: number; value: number }[];
    }[];
  }>;
  recommendation: { test: string; posthoc: string; reasons: string[]; caveats: string[] };
  options: { alpha: number };
}
