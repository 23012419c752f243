import type { CodedText } from "../vocabulary/coded-text.js";
import type {
  Comparisons,
  OmnibusTest,
  OutcomeQuestion,
  PlannedSizes,
  Policy,
  PosthocFamily,
  Scale,
} from "../vocabulary/ids.js";
import { posthocFamilyFor } from "../vocabulary/posthoc-family.js";
import { note } from "./note.js";
import { PLAN_SWITCH_MAX_SD_RATIO, PLAN_SWITCH_MAX_SIZE_RATIO } from "./thresholds.js";

export type { OutcomeQuestion, PlannedSizes };

/** The design answers that decide the primary test before any data are seen. */
export interface TestPlanDesign {
  independent: boolean | "paired";
  scale: Scale;
  question: OutcomeQuestion;
  comparisons: Comparisons;
  policy: Policy;
  plannedSizes: PlannedSizes;
}

/**
 * The one rule a classic-first plan names in advance: classic ANOVA stays the primary test
 * while the groups stay balanced and their spreads similar; otherwise Welch's ANOVA.
 */
export interface SwitchRule {
  to: "welch";
  maxSdRatio: number;
  maxSizeRatio: number;
  text: string;
}

export interface TestPlan {
  test: OmnibusTest;
  posthoc: PosthocFamily;
  rule: SwitchRule | null;
  reasons: CodedText[];
}

export interface OutOfScopePlan {
  test: "out-of-scope";
  posthoc: "none";
  rule: null;
  reasons: CodedText[];
}

export const CLASSIC_TO_WELCH_RULE: SwitchRule = {
  to: "welch",
  maxSdRatio: PLAN_SWITCH_MAX_SD_RATIO,
  maxSizeRatio: PLAN_SWITCH_MAX_SIZE_RATIO,
  text: `Classic one-way ANOVA stays the primary test while the largest group has at most ${PLAN_SWITCH_MAX_SIZE_RATIO} times as many values as the smallest and the largest SD is at most ${PLAN_SWITCH_MAX_SD_RATIO} times the smallest; otherwise Welch's ANOVA is used.`,
};

/**
 * Decides the primary omnibus test and its post-hoc family from the design alone, before any
 * data are seen (the pre-specified analysis; choosing from pre-tests on the same data inflates
 * the error rate: Zimmerman 2004, British Journal of Mathematical and Statistical Psychology 57,
 * 173–181; Rasch, Kubinger & Moder 2011, Statistical Papers 52, 219–231).
 * Rules:
 * 1. Matched or repeated measurements → out of scope.
 * 2. An ordinal outcome, or a question about which group tends to have larger values →
 *    Kruskal–Wallis with Dunn's comparisons (it tests stochastic ordering, not means:
 *    Fagerland & Sandvik 2009, Statistics in Medicine 28, 1487–1497).
 * 3. A question about means → Welch's ANOVA with Games–Howell (or Welch t against a control),
 *    which keeps its error rate when spreads differ and loses little when they are equal
 *    (Delacre, Leys, Mora & Lakens 2019, International Review of Social Psychology 32(1), 13).
 * 4. Under the classic-first policy a means question keeps classic ANOVA only when the plan
 *    puts equal numbers in every group (where classic ANOVA is most robust), with the one
 *    rule CLASSIC_TO_WELCH_RULE that moves it to Welch's ANOVA after the data. No rule moves a
 *    means question to a rank test because of the data.
 * Example: planTest({ independent: true, scale: "continuous", question: "means",
 *   comparisons: "all-pairs", policy: "welch-first", plannedSizes: "equal" }).test → "welch".
 * Cost: O(1). Pure.
 */
export function planTest(design: TestPlanDesign): TestPlan | OutOfScopePlan {
  if (design.independent !== true) {
    return {
      test: "out-of-scope",
      posthoc: "none",
      rule: null,
      reasons: [
        note(
          "plan.not-independent",
          {},
          "The measurements are matched or repeated on the same units, so the groups are not independent; that design needs repeated-measures ANOVA or a mixed model, or the Friedman test for ranks, which this analysis does not cover.",
        ),
      ],
    };
  }
  const reasons: CodedText[] = [];
  let test: OmnibusTest;
  let rule: SwitchRule | null = null;
  if (design.scale === "ordinal") {
    test = "kruskal-wallis";
    reasons.push(
      note(
        "plan.ordinal",
        {},
        "The outcome is ordinal, so means are not meaningful; the Kruskal–Wallis test asks whether some group tends to have larger values.",
      ),
    );
  } else if (design.question === "larger-values") {
    test = "kruskal-wallis";
    reasons.push(
      note(
        "plan.larger-values",
        {},
        "The question is whether some group tends to have larger values than another, which is what the Kruskal–Wallis test asks; it does not compare means.",
      ),
    );
  } else if (design.policy === "classic-first" && design.plannedSizes === "equal") {
    test = "anova";
    rule = CLASSIC_TO_WELCH_RULE;
    reasons.push(
      note(
        "plan.classic-balanced",
        {},
        "The question is about means, the organization's policy puts classic one-way ANOVA first, and the plan puts the same number of units in every group, where classic ANOVA is least sensitive to unequal spreads.",
      ),
      note("plan.switch-rule", { maxSdRatio: rule.maxSdRatio, maxSizeRatio: rule.maxSizeRatio }, rule.text),
    );
  } else {
    test = "welch";
    reasons.push(
      note(
        "plan.welch-means",
        {},
        "The question is about means. Welch's ANOVA compares means without assuming equal spreads: it keeps its error rate when spreads differ and loses little power when they are equal (Delacre, Leys, Mora & Lakens 2019).",
      ),
    );
    if (design.policy === "classic-first") {
      reasons.push(
        note(
          "plan.classic-unbalanced",
          {},
          "The organization's policy puts classic ANOVA first, but the plan does not commit to the same number of units in every group; with unequal sizes classic ANOVA's error rate depends on which group has the larger spread, so the plan uses Welch's ANOVA.",
        ),
      );
    }
  }
  return { test, posthoc: posthocFamilyFor(test, design.comparisons), rule, reasons };
}
