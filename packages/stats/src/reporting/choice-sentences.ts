import type { TestDecision } from "../choice/decide-test.js";
import type { ErrorRateCheckResult, TestErrorRate } from "../choice/error-rate-check.js";
import type { SensitivityAnalyses } from "../choice/sensitivity.js";
import type { OmnibusTest, SensitivityTest } from "../vocabulary/ids.js";
import { POSTHOC_TERMS, SENSITIVITY_TERMS, TEST_TERMS } from "../vocabulary/names.js";
import type { Unavailable } from "../types/group-summary.js";
import { formatP, formatPercent, formatUnit } from "./format.js";

/**
 * The sentences that tell the story of the test choice — what the plan decided, any deviation,
 * the sensitivity analyses and the error-rate check — written once here and read by the report
 * (preview and DOCX), the web app and the command line.
 */

const RATE_KEY: Record<SensitivityTest, keyof ErrorRateCheckResult["rates"]> = {
  anova: "anova",
  welch: "welch",
  "kruskal-wallis": "kruskalWallis",
  "trimmed-means": "trimmedMeans",
};

/** "The locked plan named Welch's ANOVA, followed by Games–Howell comparisons of all pairs, as the primary test." */
export function primaryTestSentence(decision: TestDecision): string {
  if (decision.test === "out-of-scope") return "The design is outside what these tests cover.";
  const planned = decision.planned === "out-of-scope" ? decision.test : decision.planned;
  const posthoc = decision.posthoc === "none" ? "" : `, followed by ${POSTHOC_TERMS[decision.posthoc].name},`;
  if (decision.ruleApplied)
    return `The locked plan named ${TEST_TERMS[planned].name} as the primary test, with one rule that moves it to ${TEST_TERMS[decision.test].name}; the rule applied to these data, so the primary test is ${TEST_TERMS[decision.test].name}${posthoc.replace(/,$/, "")}.`;
  return `The locked plan named ${TEST_TERMS[decision.test].name}${posthoc} as the primary test, before any data were seen.`;
}

/** The deviation from the plan in one sentence, with the analyst's own words. */
export function deviationSentence(planned: OmnibusTest, chosen: OmnibusTest, justification: string): string {
  return `Deviation from the plan: ${TEST_TERMS[chosen].name} was run instead of the plan's primary test, ${TEST_TERMS[planned].name}. The analyst's justification: “${justification}”`;
}

/** "Sensitivity analyses at α = .05: classic one-way ANOVA p = .012; …" followed by the notes. */
export function sensitivitySentences(s: SensitivityAnalyses | Unavailable): string[] {
  if ("available" in s && s.available === false) return [`No sensitivity analyses: ${s.reason}`];
  const a = s as SensitivityAnalyses;
  const parts = a.entries.map((e) =>
    e.available
      ? `${SENSITIVITY_TERMS[e.test].name} p ${formatP(e.p)}`
      : `${SENSITIVITY_TERMS[e.test].name} could not be computed (${e.reason})`,
  );
  const lead = parts.length
    ? `Sensitivity analyses beside the primary ${SENSITIVITY_TERMS[a.primary].name}, at α = ${formatUnit(a.alpha)}: ${parts.join("; ")}.`
    : "No sensitivity analysis could be computed.";
  return [lead, ...a.notes.map((n) => n.text)];
}

function rateText(r: TestErrorRate | Unavailable): string | null {
  return r.available ? formatPercent(r.rate) : null;
}

/**
 * The error-rate check in plain words, the primary test first: "With data like these (2,000
 * simulated data sets …), Welch's ANOVA falsely finds a difference 5.2% of the time at α = .05;
 * classic one-way ANOVA 14.1%; …". A primary rate clearly above α (by more than 3 Monte Carlo
 * standard errors) adds a caution.
 */
export function errorRateSentences(
  check: ErrorRateCheckResult | Unavailable,
  primary: OmnibusTest | "out-of-scope",
): string[] {
  if (!check.available) return [`The error-rate check was not run: ${check.reason}`];
  const order: SensitivityTest[] = [
    ...(primary === "out-of-scope" ? [] : [primary]),
    ...(["welch", "anova", "kruskal-wallis", "trimmed-means"] as const).filter((t) => t !== primary),
  ];
  const rated = order
    .map((t) => ({ t, text: rateText(check.rates[RATE_KEY[t]]) }))
    .filter((x): x is { t: SensitivityTest; text: string } => x.text !== null);
  if (rated.length === 0) return ["The error-rate check could not compute any of the tests on these data."];
  const [first, ...rest] = rated;
  const runs = check.runs.toLocaleString("en-US");
  const lines = [
    `With data like these (${runs} simulated data sets with the observed group sizes, spreads and shapes and equal centres, seed ${check.seed}), ${SENSITIVITY_TERMS[first!.t].name} falsely finds a difference ${first!.text} of the time at α = ${formatUnit(check.alpha)}${rest.length ? `; ${rest.map((r) => `${SENSITIVITY_TERMS[r.t].name} ${r.text}`).join("; ")}` : ""}.`,
  ];
  if (primary !== "out-of-scope") {
    const r = check.rates[RATE_KEY[primary]];
    if (r.available && r.rate > check.alpha + 3 * r.standardError) {
      lines.push(
        `With data like these the primary test finds a difference more often than α when there is none, so read a p-value near α with caution and look at the sensitivity analyses.`,
      );
    }
  }
  return [...lines, ...check.notes];
}
