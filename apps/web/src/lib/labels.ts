import type { StudyContext } from "@waymark/contract";
import {
  ADJUSTMENT_TERMS,
  COMPARISON_TERMS,
  POLICY_TERMS,
  POSTHOC_TERMS,
  TEST_TERMS,
  type Adjustment,
  type Comparisons,
} from "@waymark/stats/vocabulary";

/**
 * The words screens use for ids, read from the one vocabulary in @waymark/stats (the API's
 * report and the command line read the same). Only the web's own labels are declared here.
 */
const known = <T extends object>(terms: T, id: string | null | undefined): id is Extract<keyof T, string> =>
  !!id && Object.hasOwn(terms, id);

/** Capitalises the first letter, for a name that starts a sentence. */
export function sentenceStart(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/** A test's name mid-sentence ("classic one-way ANOVA", "the Kruskal–Wallis test"). */
export function testName(test: string | null | undefined): string {
  return known(TEST_TERMS, test) ? TEST_TERMS[test].name : "the planned test";
}

/** A test's name for a heading, a table cell or the start of a line. */
export function testTitle(test: string | null | undefined): string {
  return known(TEST_TERMS, test) ? TEST_TERMS[test].title : "The planned test";
}

/** A post-hoc family's name ("Tukey–Kramer comparisons of all pairs"). */
export function posthocName(family: string | null | undefined): string {
  if (family === "none") return "no post-hoc comparisons";
  return known(POSTHOC_TERMS, family) ? POSTHOC_TERMS[family].name : "the matched post-hoc method";
}

export function adjustmentTitle(adjust: string | null | undefined): string {
  return known(ADJUSTMENT_TERMS, adjust) ? ADJUSTMENT_TERMS[adjust].title : "—";
}

export function policyTitle(policy: string | null | undefined): string {
  return known(POLICY_TERMS, policy) ? POLICY_TERMS[policy].title : "—";
}

export function comparisonName(comparisons: string | null | undefined): string {
  return known(COMPARISON_TERMS, comparisons) ? COMPARISON_TERMS[comparisons].name : "—";
}

/** What each adjustment does, for the choices in the plan and the organization's settings. */
export const ADJUSTMENT_HINTS: Record<Adjustment, string> = {
  holm: "Controls the family-wise error rate like Bonferroni, but tests the smallest p first and is never less powerful.",
  bonferroni: "Multiplies each p by the number of comparisons: simple and strict.",
  bh: "Controls the expected share of false discoveries instead of the chance of any; suits screening, not confirmation.",
};

export const CONTEXT_LABELS: Record<StudyContext, string> = {
  general: "General",
  clinical: "Clinical",
  "safety-critical": "Safety-critical",
};

/** Number of planned comparisons for k groups. */
export function plannedComparisons(k: number, comparisons: Comparisons): number {
  if (k < 2) return 0;
  return comparisons === "vs-control" ? k - 1 : (k * (k - 1)) / 2;
}
