import type {
  Adjustment,
  CheckId,
  Comparisons,
  OmnibusTest,
  Policy,
  PosthocFamily,
  SensitivityTest,
} from "./ids.js";

/**
 * How a method is named to users. `name` reads mid-sentence ("… was classic one-way ANOVA"),
 * `title` starts a line or fills a table cell, `short` fits a column header or a compact list,
 * `sentence` describes the method in the report's methods section.
 */
export interface Term {
  name: string;
  title: string;
  short: string;
  sentence: string;
}

export const TEST_TERMS: Record<OmnibusTest, Term> = {
  anova: {
    name: "classic one-way ANOVA",
    title: "Classic one-way ANOVA",
    short: "Classic ANOVA",
    sentence: "classic one-way analysis of variance, which assumes equal variances in the groups",
  },
  welch: {
    name: "Welch's ANOVA",
    title: "Welch's ANOVA",
    short: "Welch's ANOVA",
    sentence: "Welch's heteroscedastic one-way ANOVA, which does not assume equal variances",
  },
  "kruskal-wallis": {
    name: "the Kruskal–Wallis test",
    title: "Kruskal–Wallis test",
    short: "Kruskal–Wallis",
    sentence: "the Kruskal–Wallis rank test, which compares the groups' rank distributions",
  },
};

/** The omnibus tests and the test on trimmed means, which is reported only beside the primary test. */
export const SENSITIVITY_TERMS: Record<SensitivityTest, Term> = {
  ...TEST_TERMS,
  "trimmed-means": {
    name: "the test on 20% trimmed means",
    title: "Test on 20% trimmed means",
    short: "Trimmed means",
    sentence:
      "a heteroscedastic one-way test on 20% trimmed means with winsorized variances, which gives the tails less weight",
  },
};

/** `sentence` may name the adjustment through {adjustment}; `posthocSentence` fills it in. */
export const POSTHOC_TERMS: Record<PosthocFamily, Term> = {
  "tukey-kramer": {
    name: "Tukey–Kramer comparisons of all pairs",
    title: "Tukey–Kramer comparisons of all pairs",
    short: "Tukey–Kramer",
    sentence:
      "pairwise comparisons with the Tukey–Kramer procedure, which controls the family-wise error rate with simultaneous 95% confidence intervals",
  },
  "games-howell": {
    name: "Games–Howell comparisons of all pairs",
    title: "Games–Howell comparisons of all pairs",
    short: "Games–Howell",
    sentence:
      "pairwise comparisons with the Games–Howell procedure, which does not assume equal variances and gives simultaneous 95% confidence intervals",
  },
  dunn: {
    name: "Dunn's rank comparisons of all pairs",
    title: "Dunn's rank comparisons of all pairs",
    short: "Dunn",
    sentence:
      "pairwise comparisons with Dunn's test on mean ranks (two-sided, tie-corrected), with {adjustment}",
  },
  dunnett: {
    name: "Dunnett's comparisons with the control",
    title: "Dunnett's comparisons with the control",
    short: "Dunnett",
    sentence:
      "comparisons of each group with the control by Dunnett's procedure, with simultaneous 95% confidence intervals",
  },
  "welch-vs-control-holm": {
    name: "Welch t tests against the control (Holm-adjusted)",
    title: "Welch t tests against the control (Holm-adjusted)",
    short: "Welch t vs control",
    sentence: "Welch t tests of each group against the control with Holm's adjustment",
  },
  "dunn-vs-control": {
    name: "Dunn's rank comparisons with the control",
    title: "Dunn's rank comparisons with the control",
    short: "Dunn vs control",
    sentence: "Dunn's test of each group against the control with {adjustment}",
  },
};

export const ADJUSTMENT_TERMS: Record<Adjustment, Term> = {
  holm: {
    name: "Holm's step-down adjustment",
    title: "Holm (step-down)",
    short: "Holm",
    sentence: "Holm's step-down adjustment",
  },
  bonferroni: {
    name: "the Bonferroni adjustment",
    title: "Bonferroni",
    short: "Bonferroni",
    sentence: "the Bonferroni adjustment",
  },
  bh: {
    name: "the Benjamini–Hochberg adjustment",
    title: "Benjamini–Hochberg (false discovery rate)",
    short: "Benjamini–Hochberg",
    sentence: "the Benjamini–Hochberg false-discovery-rate adjustment",
  },
};

export const CHECK_TERMS: Record<CheckId, Term> = {
  "shapiro-wilk": {
    name: "the Shapiro–Wilk test",
    title: "Shapiro–Wilk test",
    short: "Shapiro–Wilk",
    sentence: "Shapiro–Wilk tests of normality within each group and on the pooled within-group residuals",
  },
  levene: {
    name: "Levene's test (mean-centred)",
    title: "Levene's test (mean-centred)",
    short: "Levene",
    sentence: "Levene's test of equal spread on absolute deviations from the group means",
  },
  "brown-forsythe": {
    name: "the Brown–Forsythe test (median-centred)",
    title: "Brown–Forsythe test (median-centred)",
    short: "Brown–Forsythe",
    sentence: "the Brown–Forsythe test of equal spread on absolute deviations from the group medians",
  },
  bartlett: {
    name: "Bartlett's test",
    title: "Bartlett's test",
    short: "Bartlett",
    sentence: "Bartlett's test of equal variances, which is sensitive to non-normality",
  },
  "sd-ratio": {
    name: "the ratio of the largest to the smallest SD",
    title: "Largest SD / smallest SD",
    short: "SD ratio",
    sentence: "the ratio of the largest to the smallest group standard deviation",
  },
  outliers: {
    name: "the outlier screen",
    title: "Outlier screen",
    short: "Outliers",
    sentence: "Tukey's fences at 1.5 and 3 IQR and studentized residuals beyond ±3",
  },
};

export const POLICY_TERMS: Record<Policy, Term> = {
  "classic-first": {
    name: "the classic-first policy",
    title: "Classic ANOVA first",
    short: "Classic first",
    sentence:
      "Use classic one-way ANOVA and move to Welch's ANOVA only when the groups' spread clearly differs.",
  },
  "welch-first": {
    name: "the welch-first policy",
    title: "Welch's ANOVA first",
    short: "Welch first",
    sentence:
      "Use Welch's ANOVA from the start: it holds its error rate when spreads differ and loses little when they are equal.",
  },
};

export const COMPARISON_TERMS: Record<Comparisons, Term> = {
  "all-pairs": {
    name: "every pair of groups",
    title: "All pairs",
    short: "All pairs",
    sentence: "all pairwise comparisons",
  },
  "vs-control": {
    name: "each group against the control",
    title: "Each group against the control",
    short: "Against control",
    sentence: "comparisons of each group with the control",
  },
};

/** The report's description of a post-hoc family, with the adjustment named where it applies. */
export function posthocSentence(family: PosthocFamily, adjustment: Adjustment): string {
  return POSTHOC_TERMS[family].sentence.replace("{adjustment}", ADJUSTMENT_TERMS[adjustment].sentence);
}

/** Name lookups that accept any text (stored records, older ids) and fall back to it unchanged. */
function lookup<K extends string>(terms: Record<K, Term>, field: keyof Term) {
  return (id: string | null | undefined, fallback = "—"): string =>
    id && Object.hasOwn(terms, id) ? terms[id as K][field] : (id ?? fallback);
}

export const testName = lookup(TEST_TERMS, "name");
export const testTitle = lookup(TEST_TERMS, "title");
export const posthocName = lookup(POSTHOC_TERMS, "name");
export const adjustmentName = lookup(ADJUSTMENT_TERMS, "name");
export const adjustmentTitle = lookup(ADJUSTMENT_TERMS, "title");
export const policyTitle = lookup(POLICY_TERMS, "title");
