import {
  deviationSentence,
  errorRateSentences,
  primaryTestSentence,
  sensitivitySentences,
  ADJUSTMENT_TERMS,
  checkReadings,
  familyWiseError,
  formatStat,
  formatUnit,
  isAvailable,
  midSentence,
  omnibusSentence,
  POSTHOC_TERMS,
  posthocSentence,
  TEST_TERMS,
  type PosthocFamily,
  type PowerMethod,
} from "@waymark/stats";
import { comparisonsOf } from "../studies/plan.js";
import { paragraph, type Block } from "./report-blocks.js";
import type { ReportInput } from "./report-input.js";
import { intervalPairs, posthocTable } from "./posthoc-table.js";
import { REFERENCES, type ReferenceKey } from "./references.js";

const ASSIGNMENT: Record<string, string> = {
  randomized: "Units were randomly assigned to the groups.",
  convenience:
    "Units were allocated to groups as they came (not randomized), so differences between groups may partly reflect how units were allocated.",
  observational:
    "Groups were observed as they occurred (no assignment), so differences cannot be attributed to the grouping factor alone.",
  unsure: "How units were assigned to groups was not recorded.",
};

/** The post-hoc families whose p-values take the plan's adjustment (the others control the error rate by their own distribution). */
const ADJUSTED_FAMILIES = new Set<PosthocFamily>(["dunn", "dunn-vs-control"]);

const POWER_METHOD_WORDS: Record<PowerMethod, string> = {
  "noncentral-f": "noncentral F distribution",
  "noncentral-f-welch-approximation": "noncentral F of classic ANOVA, an approximation for Welch's ANOVA",
  simulation: "seeded simulation of normal groups",
};

const CAUTION =
  "This analysis supports, and does not replace, the judgement of a qualified statistician and the codes, regulations and licensed practice that apply to this work. Decisions that affect safety or health must rest on those, not on a p-value.";

const date = (d: Date | string | null) =>
  d ? new Date(d).toISOString().replace("T", " ").slice(0, 16) + " UTC" : "—";

/** The references each post-hoc family cites (Hedges' g goes with every mean-based family). */
const FAMILY_REFERENCES: Record<PosthocFamily, readonly ReferenceKey[]> = {
  "tukey-kramer": ["tukey", "kramer", "hedges"],
  "games-howell": ["gamesHowell", "hedges"],
  dunnett: ["dunnett", "hedges"],
  "welch-vs-control-holm": ["welchT", "holm", "bonferroni", "hedges"],
  dunn: ["dunn", "hodgesLehmann", "bonferroni"],
  "dunn-vs-control": ["dunn", "hodgesLehmann", "bonferroni"],
};

const list = (xs: string[]) =>
  xs.length <= 1 ? (xs[0] ?? "") : `${xs.slice(0, -1).join(", ")} and ${xs[xs.length - 1]}`;

/**
 * Builds the methods-and-results section from stored records: the study, its locked plan and
 * design answers, the dataset version, the stored analysis and the approval. Pure.
 */
export function buildReport(input: ReportInput): Block[] {
  const { study, dataset, analysis, signature } = input;
  const r = analysis.result;
  const chosen = analysis.chosenTest;
  const family = analysis.posthocMethod;
  const adjustment = ADJUSTMENT_TERMS[study.plan.adjust].sentence;
  const vsControl = comparisonsOf(study.design) === "vs-control" && !!study.controlLevel;
  const alpha = study.plan.alpha;
  const unit = study.outcomeUnit;
  const refs = new Set<ReferenceKey>(["shapiroWilk", "royston", "brownForsythe", "levene", "tukeyEda"]);
  const blocks: Block[] = [];
  const k = study.levels.length;

  blocks.push({ type: "heading", level: 1, text: study.title });
  if (input.draft)
    blocks.push({
      type: "caution",
      text: "Draft — not approved. This section has not been signed off by a reviewer and must not be used as the analysis of record.",
    });

  // Methods
  blocks.push({ type: "heading", level: 2, text: "Methods" });
  blocks.push({ type: "heading", level: 3, text: "Design" });
  const control =
    study.controlLevel && study.design.hasControl === "yes"
      ? ` ${study.controlLevel} served as the control group.`
      : "";
  blocks.push(
    paragraph(
      `The study compared ${midSentence(study.outcomeName)}${unit ? ` (${unit})` : ""} across k = ${k} independent groups defined by ${study.factorName.toLowerCase()}: ${list(study.levels)}.${control} ${ASSIGNMENT[study.design.assignment ?? "unsure"]} The outcome was treated as ${study.design.scale === "ordinal" ? "ordinal" : "continuous"}.`,
      "methods",
    ),
  );
  blocks.push({ type: "heading", level: 3, text: "Pre-specified plan" });
  blocks.push(
    paragraph(
      `The analysis plan was locked on ${date(study.planLockedAt)}, before the data were uploaded (dataset version ${dataset.version}, uploaded ${date(dataset.uploadedAt)}). It fixed the significance level at α = ${formatUnit(alpha)}, the organization's ${study.plan.policy} test policy and ${vsControl ? `comparisons of each group with ${study.controlLevel}` : "all pairwise comparisons"}${ADJUSTED_FAMILIES.has(family) ? `, with ${adjustment} for their p-values` : ""}.` +
        (study.plan.power
          ? ` The planned sample size was ${study.plan.power.nPerGroup} per group, for power ${formatUnit(study.plan.power.achievedPower)} to detect an effect of Cohen's f = ${formatStat(study.plan.power.effectF)} with the primary test (${POWER_METHOD_WORDS[study.plan.power.method ?? "noncentral-f"]}).`
          : ""),
      "methods",
    ),
  );
  if (study.plan.power) refs.add("cohen");
  blocks.push({ type: "heading", level: 3, text: "Choice of test" });
  const decision = r.recommendation;
  // The plan decided the primary test from the design; the checks informed, never switched it.
  blocks.push(
    paragraph(`${primaryTestSentence(decision)} ${decision.reasons.map((x) => x.text).join(" ")}`, "methods"),
  );
  refs.add("zimmerman");
  if (decision.test === "welch" || decision.planned === "welch") refs.add("delacre");
  if (decision.planned === "kruskal-wallis") refs.add("fagerland");
  blocks.push(
    paragraph(
      "The checks — Shapiro–Wilk tests within each group on standardized residuals, the Brown–Forsythe (median-centred) and Levene (mean-centred) tests and the ratio of the largest to the smallest SD for spread, and fences for far values that account for each group's size (Grubbs-type, 5% false-flag rate per group) — informed the reading of the results and the sensitivity analyses; they did not choose the test, because choosing a test from pre-tests on the same data inflates its error rate.",
      "methods",
    ),
  );
  refs.add("grubbs");
  for (const line of errorRateSentences(r.errorRateCheck, decision.test))
    blocks.push(paragraph(line, "methods"));
  if (r.errorRateCheck.available) refs.add("efron");
  for (const line of sensitivitySentences(r.sensitivity)) blocks.push(paragraph(line, "methods"));
  if (isAvailable(r.trimmedMeans)) refs.add("yuen");
  const planned = analysis.recommendedTest;
  if (analysis.overrideJustification && planned !== chosen) {
    blocks.push(paragraph(deviationSentence(planned, chosen, analysis.overrideJustification), "methods"));
  }
  const simultaneous = (m: number) =>
    m === 1
      ? `${formatStat((1 - alpha) * 100, 0)}% level`
      : `level 1 − α/${m} (${formatStat((1 - alpha / m) * 100, 2)}%) so that the ${m} intervals hold ${formatStat((1 - alpha) * 100, 0)}% together (Bonferroni)`;
  const pairsInFamily = vsControl ? k - 1 : (k * (k - 1)) / 2;
  // The intervals each family adds beyond the vocabulary's description of the test itself.
  const intervalWords: Partial<Record<PosthocFamily, string>> = {
    "welch-vs-control-holm": `, and Welch confidence intervals for each difference from the control, each at the ${simultaneous(k - 1)}`,
    dunn: `, and the Hodges–Lehmann estimate of each pair's shift with a distribution-free interval from the Mann–Whitney statistic, each at the ${simultaneous(pairsInFamily)}`,
    "dunn-vs-control": `, and the Hodges–Lehmann estimate of each group's shift from the control with a distribution-free interval from the Mann–Whitney statistic, each at the ${simultaneous(k - 1)}`,
  };
  blocks.push(
    paragraph(
      `The omnibus test reported below is ${TEST_TERMS[chosen].name}${planned === chosen ? ", the plan's primary test" : ""}, followed by ${posthocSentence(family, study.plan.adjust)}${intervalWords[family] ?? ""}. Effect sizes are reported with each result.`,
      "methods",
    ),
  );
  if (chosen === "anova") (["fisher", "hays"] as const).forEach((x) => refs.add(x));
  if (chosen === "welch") (["welch", "hays"] as const).forEach((x) => refs.add(x));
  if (chosen === "kruskal-wallis") (["kruskal", "tomczak"] as const).forEach((x) => refs.add(x));
  for (const x of FAMILY_REFERENCES[family]) refs.add(x);
  if (family === "dunn" || family === "dunn-vs-control") {
    if (study.plan.adjust === "holm") refs.add("holm");
    if (study.plan.adjust === "bh") refs.add("bh");
  }
  if (isAvailable(r.anova) && isAvailable(r.anova.etaSquaredCi)) refs.add("steiger");

  blocks.push({ type: "heading", level: 3, text: "Data and missing values" });
  const rep = dataset.report;
  const reasons = new Map<string, number>();
  for (const e of rep.excluded) reasons.set(e.reason, (reasons.get(e.reason) ?? 0) + 1);
  const why = [...reasons].map(([reason, n]) => `${n} ${reason.replace("-", " ")}`).join(", ");
  blocks.push(
    paragraph(
      `The data file (${dataset.fileName}, SHA-256 ${dataset.sha256}) held ${rep.rowsRead} rows; ${rep.rowsUsed} values were analysed` +
        (rep.excludedCount > 0
          ? ` and ${rep.excludedCount} row${rep.excludedCount === 1 ? " was" : "s were"} excluded (${why}).`
          : "; no rows were excluded.") +
        ` Analyses were run with Waymark ${input.appVersion} (statistics engine ${analysis.engineVersion}).`,
      "methods",
    ),
  );

  // Results
  blocks.push({ type: "heading", level: 2, text: "Results" });
  const g = (x: unknown, d = 2) => (typeof x === "number" && Number.isFinite(x) ? formatStat(x, d) : "—");
  blocks.push({
    type: "table",
    caption: `Table 1. ${study.outcomeName}${unit ? ` (${unit})` : ""} by ${study.factorName.toLowerCase()}`,
    header: ["Group", "n", "Mean", "SD", "95% CI of the mean", "Median", "IQR"],
    rows: r.groups.map((x) => [
      String(x.name),
      String(x.n),
      g(x.mean),
      g(x.sd),
      typeof x.ciLower === "number" && typeof x.ciUpper === "number"
        ? `[${g(x.ciLower)}, ${g(x.ciUpper)}]`
        : "—",
      g(x.median),
      typeof x.q1 === "number" && typeof x.q3 === "number" ? `${g(x.q1)}–${g(x.q3)}` : "—",
    ]),
  });
  blocks.push({ type: "heading", level: 3, text: "Assumption checks" });
  for (const reading of checkReadings(r)) blocks.push(paragraph(reading.text, "results"));
  blocks.push({ type: "heading", level: 3, text: "Omnibus test" });
  const omni = omnibusSentence(r, chosen);
  blocks.push(paragraph(`${TEST_TERMS[chosen].title}: ${omni}.`, "results"));
  for (const line of analysis.summary) blocks.push(paragraph(line, "results"));
  blocks.push({ type: "heading", level: 3, text: "Post-hoc comparisons" });
  const table = posthocTable(r.posthoc, family, unit, alpha);
  if ("reason" in table)
    blocks.push(paragraph(`The post-hoc comparisons could not be computed: ${table.reason}.`, "results"));
  else {
    blocks.push({
      type: "table",
      caption: `Table 2. ${POSTHOC_TERMS[family].title}`,
      header: table.header,
      rows: table.rows,
    });
    table.notes.forEach((note, i) => blocks.push(paragraph(`Note ${i + 1}. ${note}`, "results")));
  }
  blocks.push({
    type: "figure",
    figure: "groups",
    caption: `Figure 1. ${study.outcomeName} in each group: box (quartiles and median) with every value shown.`,
  });
  // The figure only when some pair has an interval, so the report never holds an empty figure.
  if (!("reason" in table) && intervalPairs(r.posthoc, family).length > 0) {
    const what =
      chosen === "kruskal-wallis"
        ? "Hodges–Lehmann shifts between groups with simultaneous"
        : "Differences between group means with simultaneous";
    blocks.push({
      type: "figure",
      figure: "intervals",
      caption: `Figure 2. ${what} ${formatStat((1 - alpha) * 100, 0)}% confidence intervals (${POSTHOC_TERMS[family].short}); intervals that cross zero show no clear difference.`,
    });
  }
  // From the plan's comparisons (k − 1 against a control, else all pairs), not from whatever
  // family size an older stored analysis recorded.
  const fwe = familyWiseError({ k, alpha, comparisons: vsControl ? "vs-control" : "all-pairs" });
  blocks.push(
    paragraph(
      `With m = ${fwe.m} ${fwe.m === 1 ? "comparison" : "comparisons"}${vsControl ? ` against ${study.controlLevel}` : ""}, unadjusted tests at α = ${formatUnit(alpha)} would have a family-wise error rate of up to ${formatUnit(fwe.fwerIndependent, 3)} (1 − (1 − α)^m for independent tests); the post-hoc method above keeps it at α.`,
      "results",
    ),
  );

  if (study.context !== "general") blocks.push({ type: "caution", text: CAUTION });

  blocks.push({ type: "heading", level: 2, text: "Sign-off" });
  blocks.push(
    paragraph(
      signature
        ? `Approved by ${signature.signerName} on ${date(signature.signedAt)} with the signature “${signature.meaning}” (content hash ${signature.contentHash.slice(0, 16)}…).`
        : "Not approved: no reviewer has signed this analysis.",
      "sign-off",
    ),
  );
  blocks.push(
    paragraph(
      `Generated by Waymark ${input.appVersion} on ${date(input.generatedAt)} from analysis ${analysis.id} of study ${study.id}.`,
      "sign-off",
    ),
  );

  blocks.push({ type: "heading", level: 2, text: "References" });
  blocks.push({
    type: "references",
    items: [...refs].map((k) => REFERENCES[k]).sort((a, b) => a.localeCompare(b)),
  });
  return blocks;
}
