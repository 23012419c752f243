import type {
  Adjustment,
  ComparisonSet,
  Policy,
  StudyContext,
  StudyStatus,
  TestId,
} from "@/features/studies/types";

export const TEST_NAMES: Record<TestId, string> = {
  anova: "classic one-way ANOVA",
  welch: "Welch's ANOVA",
  "kruskal-wallis": "Kruskal–Wallis test",
};

/** Capitalised for the start of a line. */
export function testTitle(test: string | null | undefined): string {
  const name = test && test in TEST_NAMES ? TEST_NAMES[test as TestId] : "the planned test";
  return name.charAt(0).toUpperCase() + name.slice(1);
}

export function testName(test: string | null | undefined): string {
  return test && test in TEST_NAMES ? TEST_NAMES[test as TestId] : "the planned test";
}

const POSTHOC_NAMES: Record<string, string> = {
  "tukey-kramer": "Tukey–Kramer comparisons of all pairs",
  tukey: "Tukey–Kramer comparisons of all pairs",
  "games-howell": "Games–Howell comparisons of all pairs",
  dunn: "Dunn's test for all pairs",
  dunnett: "Dunnett's comparisons with the control",
  "welch-vs-control-holm": "Welch t-tests against the control, Holm-adjusted",
  "dunn-vs-control": "Dunn's test against the control",
  none: "no post-hoc comparisons",
};

export function posthocName(method: string | null | undefined): string {
  if (!method) return "the matched post-hoc method";
  return POSTHOC_NAMES[method] ?? method;
}

export const ADJUST_NAMES: Record<Adjustment, string> = {
  holm: "Holm (step-down)",
  bonferroni: "Bonferroni",
  bh: "Benjamini–Hochberg (false discovery rate)",
};

export const POLICY_TEXT: Record<Policy, { title: string; line: string }> = {
  "classic-first": {
    title: "Classic ANOVA first",
    line: "Use classic one-way ANOVA and move to Welch's ANOVA only when the groups' spread clearly differs.",
  },
  "welch-first": {
    title: "Welch's ANOVA first",
    line: "Use Welch's ANOVA from the start: it holds its error rate when spreads differ and loses little when they are equal.",
  },
};

export const COMPARISON_TEXT: Record<ComparisonSet, string> = {
  "all-pairs": "every pair of groups",
  "vs-control": "each group against the control",
};

export const CONTEXT_LABELS: Record<StudyContext, string> = {
  general: "General",
  clinical: "Clinical",
  "safety-critical": "Safety-critical",
};

export const STATUS_LABELS: Record<StudyStatus, string> = {
  draft: "Draft",
  in_review: "In review",
  approved: "Approved",
};

/** Number of planned comparisons for k groups. */
export function plannedComparisons(k: number, comparisons: ComparisonSet): number {
  if (k < 2) return 0;
  return comparisons === "vs-control" ? k - 1 : (k * (k - 1)) / 2;
}
