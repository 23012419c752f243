import type { ReviewStep } from "./types";

const TESTS: Record<string, string> = {
  anova: "Classic one-way ANOVA",
  welch: "Welch's ANOVA",
  "kruskal-wallis": "Kruskal–Wallis test",
};

/** A test's name for a table cell or the start of a line; unknown ids are shown as they are. */
export function testLabel(test: string | null | undefined): string {
  if (!test) return "—";
  return TESTS[test] ?? test;
}

export const STEP_LABELS: Record<ReviewStep, string> = {
  design: "Design",
  plan: "Plan",
  data: "Data",
  checks: "Checks",
  choice: "Test choice",
  results: "Results",
};

export const POLICY_LABELS: Record<string, string> = {
  "classic-first": "Classic ANOVA first",
  "welch-first": "Welch's ANOVA first",
};

export const ADJUST_LABELS: Record<string, string> = {
  holm: "Holm",
  bonferroni: "Bonferroni",
  bh: "Benjamini–Hochberg",
};

const POSTHOC: Record<string, string> = {
  "tukey-kramer": "Tukey–Kramer, all pairs",
  tukey: "Tukey–Kramer, all pairs",
  "games-howell": "Games–Howell, all pairs",
  dunn: "Dunn's test, all pairs",
  dunnett: "Dunnett's test against the control",
  "welch-vs-control-holm": "Welch t-tests against the control, Holm-adjusted",
  "dunn-vs-control": "Dunn's test against the control",
  none: "No post-hoc comparisons",
};

export function posthocLabel(method: string | null | undefined): string {
  if (!method) return "—";
  return POSTHOC[method] ?? method;
}

/** "1 day", "3 days"; "—" for anything that is not a whole, non-negative number. */
export function daysLabel(days: number): string {
  if (!Number.isFinite(days) || days < 0) return "—";
  const d = Math.floor(days);
  return d === 1 ? "1 day" : `${d} days`;
}
