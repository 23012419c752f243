import type { ResolvedOptions } from "./analyze-options.js";
import type { GroupDescription } from "./descriptives/describe.js";
import type { CentredSample } from "./numeric/centred-sample.js";
import { groupMoments } from "./numeric/group-moments.js";
import { familyWiseError } from "./planning/family-wise-error.js";
import { adjustPValues } from "./posthoc/p-adjust.js";
import { dunnSorted } from "./posthoc/dunn.js";
import { midranks } from "./numeric/midranks.js";
import { sortedValues } from "./numeric/sorted-values.js";
import { dunnettTest } from "./posthoc/dunnett-test.js";
import { gamesHowell } from "./posthoc/games-howell.js";
import { tukeyKramer } from "./posthoc/tukey-kramer.js";
import { welchVsControlHolm } from "./posthoc/welch-vs-control-holm.js";
import { welchControlIntervals } from "./posthoc/welch-control-intervals.js";
import { withShiftIntervals } from "./posthoc/dunn-shift-intervals.js";
import { StatsInputError } from "./errors.js";
import type { GroupSummary, Unavailable } from "./types/group-summary.js";
import type {
  AnovaPart,
  ControlFamilies,
  FamilyWiseErrorPart,
  PosthocPart,
} from "./types/analysis-result.js";

function attempt<T>(run: () => T): T | Unavailable {
  try {
    return run();
  } catch (e) {
    if (e instanceof StatsInputError) return { available: false, reason: e.message };
    throw e;
  }
}

/** An Unavailable result stays as it is; a family keeps only its pairs (the contract shape). */
function pairsOf<P>(result: Unavailable | { pairs: readonly P[] }): P[] | Unavailable {
  if ("available" in result && result.available === false) return result;
  return [...(result as { pairs: readonly P[] }).pairs];
}

/** Up to this many values in all, Dunn's pairs always get Hodges–Lehmann intervals. */
export const SHIFT_INTERVALS_FULL_N = 20_000;
const SHIFT_INTERVALS_SKIPPED = `Hodges–Lehmann intervals are computed when the plan's primary test is Kruskal–Wallis, or for up to ${SHIFT_INTERVALS_FULL_N.toLocaleString("en-US")} values in all`;

/** Welch t-tests against the control gain their simultaneous (Bonferroni) intervals. */
function withWelchIntervals<P extends { a: string }>(
  pairs: P[] | Unavailable,
  intervals: object[] | Unavailable,
): P[] | Unavailable {
  if (!Array.isArray(pairs) || !Array.isArray(intervals)) return pairs;
  const byName = new Map((intervals as { a: string }[]).map((x) => [x.a, x]));
  return pairs.map((p): P => {
    const i = byName.get(p.a) as Record<string, unknown> | undefined;
    if (!i) return p;
    if (i.available === false) return { ...p, intervalReason: i.reason };
    return {
      ...p,
      lower: i.lower,
      upper: i.upper,
      intervalLevel: i.intervalLevel,
      intervalAdjustment: i.intervalAdjustment,
    };
  });
}

/**
 * Runs the post-hoc families for analyze(): Tukey–Kramer and Games–Howell on the group
 * summaries, Dunn's rank comparisons, and, when a control is named, Dunnett, Welch t vs the
 * control with Holm, and Dunn vs the control (Dunn's pairs with the control, re-adjusted over
 * those k − 1 comparisons). Summaries are taken on the exactly centred values: every output
 * (differences, intervals, standardized effects) is shift-invariant, so large offsets cost no
 * digits. Also the family-wise error rate of the planned comparisons (k − 1 against a control,
 * else k(k − 1)/2 pairs).
 * Cost: O(k²) beyond the shared sums, plus Dunn's ranking.
 */
export function runPosthoc(
  sample: CentredSample,
  groups: GroupDescription[],
  anova: AnovaPart,
  options: ResolvedOptions,
  /** Whether Dunn's pairs get their Hodges–Lehmann intervals (see SHIFT_INTERVALS_FULL_N). */
  shiftIntervals = true,
): { posthoc: PosthocPart; familyWiseError: FamilyWiseErrorPart } {
  const alpha = options.alpha;
  // The shift intervals cost a selection over n_a·n_b differences per pair (about 2 s for 45
  // pairs of 100,000 values): computed whenever the plan's primary test is Kruskal–Wallis, and
  // for any plan up to SHIFT_INTERVALS_FULL_N values; otherwise each pair says why it has none.
  const shifts = <P extends { a: string; b: string }>(pairs: P[] | Unavailable, est: Map<string, number>) =>
    shiftIntervals
      ? withShiftIntervals(pairs, sortedByName, alpha, est)
      : Array.isArray(pairs)
        ? pairs.map((x) => ({ ...x, intervalReason: SHIFT_INTERVALS_SKIPPED }))
        : pairs;
  const summaries: GroupSummary[] = sample.groups.map((g) => {
    const m = groupMoments(g);
    return { name: g.name, n: m.n, mean: m.mean, variance: m.n > 1 ? m.ss / (m.n - 1) : 0 };
  });
  const a = anova;
  const tukey: PosthocPart["tukey"] = a.available
    ? pairsOf(attempt(() => tukeyKramer(summaries, a.msWithin, a.df2, alpha)))
    : {
        available: false,
        reason: `Tukey–Kramer needs the classic ANOVA's error variance, which is unavailable: ${a.reason}`,
      };
  const gh = attempt(() => gamesHowell(summaries, alpha));
  const gamesHowellPairs = "pairs" in gh ? [...gh.pairs] : gh;

  // Ranks only: the centred values keep every order and tie exactly, and are already sorted.
  const dunnResult = attempt(() =>
    dunnSorted(
      sample.groups.map((g) => ({ name: g.name, sorted: sortedValues(g) })),
      options.adjust,
      alpha,
      midranks(sample),
    ),
  );
  const sortedByName = new Map(sample.groups.map((g) => [g.name, sortedValues(g)]));
  const shiftEstimates = new Map<string, number>();
  const dunnPairs = shifts(pairsOf(dunnResult), shiftEstimates);

  const posthoc: PosthocPart = {
    tukey,
    gamesHowell: gamesHowellPairs,
    dunn: dunnPairs,
    adjust: options.adjust,
    dunnTwoSided: true,
  };
  const control = options.control;
  if (control !== undefined) {
    let dunnVsControl: ControlFamilies["dunn"];
    if (Array.isArray(dunnPairs)) {
      const withControl = dunnPairs.filter((x) => x.a === control || x.b === control);
      const adjusted = adjustPValues(
        withControl.map((x) => x.p),
        options.adjust,
      );
      dunnVsControl = shifts(
        withControl.map((x, i) => ({ ...x, pAdj: adjusted[i] as number })),
        shiftEstimates,
      );
    } else dunnVsControl = dunnPairs;
    posthoc.control = {
      control,
      dunnett: pairsOf(attempt(() => dunnettTest(summaries, control, alpha))),
      welchHolm: withWelchIntervals(
        pairsOf(attempt(() => welchVsControlHolm(summaries, control, alpha))),
        attempt(() => welchControlIntervals(summaries, control, alpha)),
      ),
      dunn: dunnVsControl,
    };
  }
  // The family the plan actually makes: k − 1 comparisons with the control, else every pair.
  const comparisons =
    options.comparisons === "vs-control" && control !== undefined ? "vs-control" : "all-pairs";
  const fwe = attempt(() => ({
    available: true as const,
    ...familyWiseError({ k: sample.groups.length, alpha, comparisons }),
  }));
  return { posthoc, familyWiseError: fwe };
}
