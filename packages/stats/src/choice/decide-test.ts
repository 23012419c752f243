import { formatStat } from "../reporting/format.js";
import type { CodedText } from "../vocabulary/coded-text.js";
import type { Comparisons, OmnibusTest, PosthocFamily } from "../vocabulary/ids.js";
import { TEST_TERMS } from "../vocabulary/names.js";
import { posthocFamilyFor } from "../vocabulary/posthoc-family.js";
import { note } from "./note.js";
import type { OutOfScopePlan, SwitchRule, TestPlan } from "./plan-test.js";
import { VERY_SMALL_GROUP_N } from "./thresholds.js";

/** What the decision needs from the data: sizes, spreads and which tests could be computed. */
export interface DecisionEvidence {
  groups: readonly { name: string; n: number; sd: number }[];
  comparisons: Comparisons;
  /** For each omnibus test, null when it was computed, else the reason it could not be. */
  unavailable: Record<OmnibusTest, string | null>;
}

/**
 * The test of record for one dataset: the plan's test, moved only by the plan's own rule.
 * The JSON key that holds it in `analyze()`'s result is `recommendation` (kept for the command
 * line's published contract); its content is the plan's decision, never a data-driven advice.
 */
export interface TestDecision {
  test: OmnibusTest | "out-of-scope";
  posthoc: PosthocFamily | "none";
  /** The test the plan names before the data. */
  planned: OmnibusTest | "out-of-scope";
  rule: SwitchRule | null;
  /** true when the plan's rule moved classic ANOVA to Welch's ANOVA for these data. */
  ruleApplied: boolean;
  /** false when the test of record cannot be computed on these data: a deviation is needed. */
  computable: boolean;
  reasons: CodedText[];
  caveats: CodedText[];
}

/**
 * Applies a locked test plan to one dataset. The only data-driven move is the plan's named
 * rule (classic → Welch when sizes or spreads are unbalanced); checks never move a means
 * question to a rank test. A test that cannot be computed is never presented as runnable:
 * `computable` is false and the reason says what is needed.
 * Example: decideTest(planTest({... policy: "classic-first", plannedSizes: "equal" }),
 *   { groups: [{n: 10, sd: 1}, {n: 10, sd: 3}, {n: 10, sd: 1}], ... }).test → "welch".
 * Cost: O(k). Pure.
 */
export function decideTest(plan: TestPlan | OutOfScopePlan, evidence: DecisionEvidence): TestDecision {
  if (plan.test === "out-of-scope") {
    return {
      test: "out-of-scope",
      posthoc: "none",
      planned: "out-of-scope",
      rule: null,
      ruleApplied: false,
      computable: false,
      reasons: plan.reasons,
      caveats: [],
    };
  }
  const reasons: CodedText[] = [...plan.reasons];
  const caveats: CodedText[] = [];
  const sizes = evidence.groups.map((g) => g.n);
  const minN = Math.min(...sizes);
  const maxN = Math.max(...sizes);
  let test: OmnibusTest = plan.test;
  let ruleApplied = false;

  if (plan.rule) {
    const sds = evidence.groups.map((g) => g.sd);
    const minSd = Math.min(...sds);
    const maxSd = Math.max(...sds);
    const sizeRatio = maxN / minN;
    const why: string[] = [];
    if (sizeRatio > plan.rule.maxSizeRatio) {
      why.push(`the group sizes range from ${minN} to ${maxN} (ratio ${formatStat(sizeRatio, 2)})`);
    }
    if (minSd === 0 && maxSd > 0) {
      why.push("a group has no spread at all, so the SDs cannot be balanced");
    } else if (minSd > 0 && maxSd / minSd > plan.rule.maxSdRatio) {
      why.push(`the largest SD is ${formatStat(maxSd / minSd, 2)} times the smallest`);
    }
    if (why.length > 0) {
      test = plan.rule.to;
      ruleApplied = true;
      reasons.push(
        note(
          "decision.rule-applied",
          { sizeRatio, sdRatio: minSd > 0 ? maxSd / minSd : "none" },
          `The plan's rule applies: ${why.join(" and ")}, so Welch's ANOVA is the primary test, as the plan names in advance.`,
        ),
      );
    } else {
      reasons.push(
        note(
          "decision.rule-not-applied",
          { sizeRatio, sdRatio: maxSd / minSd },
          `The plan's rule does not apply (sizes ${minN} to ${maxN}, largest SD ${formatStat(maxSd / minSd, 2)} times the smallest), so classic one-way ANOVA stays the primary test.`,
        ),
      );
    }
  }

  const missing = evidence.unavailable[test];
  const computable = missing === null;
  if (!computable) {
    reasons.push(
      note(
        "decision.not-computable",
        { test },
        `${TEST_TERMS[test].title} cannot be computed on these data: ${missing}. The planned analysis cannot run as written; choose another test as a deviation from the plan, with a written justification the reviewer will see.`,
      ),
    );
  }
  if (evidence.groups.length === 2) {
    caveats.push(
      note(
        "caveat.two-groups",
        {},
        "With two groups a two-sample test is the usual frame; the one-way tests give the same answer here (F equals t squared).",
      ),
    );
  }
  if (minN < VERY_SMALL_GROUP_N) {
    caveats.push(
      note(
        "caveat.very-small-group",
        { minN, limit: VERY_SMALL_GROUP_N },
        `The smallest group has ${minN} values (below ${VERY_SMALL_GROUP_N}), so the checks have little power and every test rests heavily on its assumptions.`,
      ),
    );
  }
  return {
    test,
    posthoc: posthocFamilyFor(test, evidence.comparisons),
    planned: plan.test,
    rule: plan.rule,
    ruleApplied,
    computable,
    reasons,
    caveats,
  };
}
