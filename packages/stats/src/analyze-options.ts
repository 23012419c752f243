import { StatsInputError } from "./errors.js";
import { DEFAULT_ALPHA } from "./choice/thresholds.js";
import { ERROR_RATE_MAX_RUNS, ERROR_RATE_SEED } from "./choice/error-rate-check.js";
import type { OutcomeQuestion, PlannedSizes, TestPlan } from "./choice/plan-test.js";

import {
  ADJUSTMENTS,
  COMPARISONS,
  POLICIES,
  SCALES,
  type Adjustment,
  type Comparisons,
  type Policy,
  type Scale,
} from "./vocabulary/ids.js";

export type { Adjustment, Comparisons, Policy, Scale };

export interface AnalyzeOptions {
  /** Significance level for tests, intervals of differences and the checks (default 0.05). */
  alpha?: number;
  /** Multiplicity adjustment for Dunn's and other p-value-based comparisons (default Holm). */
  adjust?: Adjustment;
  /** Name of the control group, for comparisons against it. */
  control?: string;
  policy?: Policy;
  scale?: Scale;
  /** Defaults to "vs-control" when a control is named, else "all-pairs". */
  comparisons?: Comparisons;
  /** false or "paired" when the same units are measured in every group (out of scope). */
  independent?: boolean | "paired";
  /** For a continuous outcome: a question about means (default) or about which group tends to have larger values. */
  question?: OutcomeQuestion;
  /** Whether the plan puts about the same number of units in every group (default "unequal", the cautious reading). */
  plannedSizes?: PlannedSizes;
  /** A locked plan's test decision; when given it is used as it stands instead of being derived from the answers above. */
  plan?: TestPlan;
  /** The seeded error-rate simulation for the data at hand; false skips it (default: run with the engine's fixed seed). */
  errorRateCheck?: false | { seed?: number; runs?: number };
}

export interface ResolvedOptions {
  alpha: number;
  adjust: Adjustment;
  control: string | undefined;
  policy: Policy;
  scale: Scale;
  comparisons: Comparisons;
  independent: boolean | "paired";
  question: OutcomeQuestion;
  plannedSizes: PlannedSizes;
  plan: TestPlan | undefined;
  errorRateCheck: false | { seed: number; runs: number | undefined };
}

function oneOf<T extends string>(name: string, value: unknown, allowed: readonly T[], fallback: T): T {
  if (value === undefined) return fallback;
  if (typeof value === "string" && (allowed as readonly string[]).includes(value)) return value as T;
  throw new StatsInputError(
    `The ${name} option must be one of ${allowed.join(", ")}; got '${String(value)}'`,
  );
}

/**
 * Validates analysis options in one place and fills in defaults; throws StatsInputError with
 * the allowed values when an option is wrong. Cost: O(k) for the control-name check.
 */
export function resolveOptions(options: AnalyzeOptions, groupNames: readonly string[]): ResolvedOptions {
  const alpha = options.alpha ?? DEFAULT_ALPHA;
  if (typeof alpha !== "number" || !(alpha > 0 && alpha < 1)) {
    throw new StatsInputError(`The alpha option must be a number between 0 and 1; got ${String(alpha)}`);
  }
  const control = options.control;
  if (control !== undefined && !groupNames.includes(control)) {
    throw new StatsInputError(
      `The control group '${control}' is not one of the groups (${groupNames.map((g) => `'${g}'`).join(", ")})`,
    );
  }
  const comparisons = oneOf(
    "comparisons",
    options.comparisons,
    COMPARISONS,
    control !== undefined ? "vs-control" : "all-pairs",
  );
  if (comparisons === "vs-control" && control === undefined) {
    throw new StatsInputError(
      "Comparisons against a control need the control option naming the control group",
    );
  }
  const independent = options.independent ?? true;
  if (independent !== true && independent !== false && independent !== "paired") {
    throw new StatsInputError(
      `The independent option must be true, false or 'paired'; got '${String(independent)}'`,
    );
  }
  return {
    alpha,
    adjust: oneOf("adjust", options.adjust, ADJUSTMENTS, "holm"),
    control,
    policy: oneOf("policy", options.policy, POLICIES, "classic-first"),
    scale: oneOf("scale", options.scale, SCALES, "continuous"),
    comparisons,
    independent,
    question: oneOf("question", options.question, ["means", "larger-values"], "means"),
    plannedSizes: oneOf("plannedSizes", options.plannedSizes, ["equal", "unequal"], "unequal"),
    plan: options.plan,
    errorRateCheck: resolveErrorRateCheck(options.errorRateCheck),
  };
}

function resolveErrorRateCheck(o: AnalyzeOptions["errorRateCheck"]): ResolvedOptions["errorRateCheck"] {
  if (o === false) return false;
  const seed = o?.seed ?? ERROR_RATE_SEED;
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new StatsInputError(`The errorRateCheck seed must be a non-negative integer; got ${String(seed)}`);
  }
  const runs = o?.runs;
  if (runs !== undefined && !(Number.isSafeInteger(runs) && runs >= 100 && runs <= ERROR_RATE_MAX_RUNS)) {
    throw new StatsInputError(
      `The errorRateCheck runs must be an integer from 100 to ${ERROR_RATE_MAX_RUNS}; got ${String(runs)}`,
    );
  }
  return { seed, runs };
}
