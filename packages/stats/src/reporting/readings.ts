import { SD_RATIO_LIMIT } from "../choice/thresholds.js";
import { formatDf, formatP, formatStat, formatUnit } from "./format.js";
import type { AnalysisResult } from "../types/analysis-result.js";
import { isAvailable as ok, reasonOf } from "../types/analysis-result.js";
import { TEST_TERMS } from "../vocabulary/names.js";
import type { OmnibusTest } from "../vocabulary/ids.js";

/** The parts of a result the readings use (a stored analysis from an older engine still fits). */
export type ResultView = Pick<
  AnalysisResult,
  | "groups"
  | "anova"
  | "welch"
  | "kruskalWallis"
  | "brownForsythe"
  | "shapiroWilk"
  | "shapiroWilkResiduals"
  | "sdRatio"
  | "outliers"
> &
  Partial<Pick<AnalysisResult, "groupNormality" | "sizeAwareOutliers">> & {
    options: Pick<AnalysisResult["options"], "alpha">;
  };

/** One plain-language line per assumption check, for the checks screen and the report. */
export interface Reading {
  key: "sizes" | "normality" | "spread" | "outliers";
  level: "ok" | "attention";
  text: string;
}

/** A rule of thumb for the SD ratio, common practice: the same threshold the test choice uses. */
const SD_RATIO_ATTENTION = SD_RATIO_LIMIT;

/**
 * Reads the assumption checks of one analysis into sentences that say what each means for the
 * study, with the numbers that triggered it, e.g. "The spread differs between groups: the
 * largest SD is 3.1 times the smallest."
 */
export function checkReadings(r: ResultView): Reading[] {
  const alpha = r.options.alpha;
  const out: Reading[] = [];
  const ns = r.groups.map((g) => g.n);
  const minN = Math.min(...ns);
  const maxN = Math.max(...ns);
  out.push({
    key: "sizes",
    level: minN < 5 ? "attention" : "ok",
    text:
      minN === maxN
        ? `${r.groups.length} groups of ${minN} values each (N = ${ns.reduce((a, b) => a + b, 0)}).`
        : `${r.groups.length} groups of unequal size, from ${minN} to ${maxN} values (N = ${ns.reduce((a, b) => a + b, 0)}).` +
          (minN < 5 ? " Groups this small give the checks little power to detect problems." : ""),
  });

  // Per group on standardized residuals (pooled residuals mix spread with shape); analyses
  // stored by an older engine carry only the pooled test, read as it was.
  const perGroup = r.groupNormality;
  const sw = r.shapiroWilkResiduals;
  if (perGroup && ok(perGroup)) {
    out.push({
      key: "normality",
      level: perGroup.summary.code === "normality.some-depart" ? "attention" : "ok",
      text: perGroup.summary.text,
    });
  } else if (ok(sw)) {
    const fails = r.shapiroWilk.filter((g) => g.available !== false && g.p < alpha).map((g) => g.group);
    out.push({
      key: "normality",
      level: sw.p < alpha ? "attention" : "ok",
      text:
        sw.p < alpha
          ? `The residuals depart from a normal distribution (Shapiro–Wilk W = ${formatStat(sw.W, 3)}, p ${formatP(sw.p)})${fails.length ? `; within groups, clearest in ${fails.join(", ")}` : ""}.`
          : `No clear departure from normality in the residuals (Shapiro–Wilk W = ${formatStat(sw.W, 3)}, p ${formatP(sw.p)}).`,
    });
  } else {
    out.push({
      key: "normality",
      level: "attention",
      text: `Normality of the residuals was not tested: ${reasonOf(sw)}.`,
    });
  }

  const bf = r.brownForsythe;
  const ratio = typeof r.sdRatio === "number" ? r.sdRatio : null;
  if (ok(bf)) {
    const differs = bf.p < alpha || (ratio !== null && ratio > SD_RATIO_ATTENTION);
    const ratioText =
      ratio !== null
        ? `the largest SD is ${formatStat(ratio, 1)} times the smallest`
        : "the SD ratio could not be computed";
    out.push({
      key: "spread",
      level: differs ? "attention" : "ok",
      text: differs
        ? `The spread differs between groups: ${ratioText} (Brown–Forsythe F(${formatDf(bf.df1)}, ${formatDf(bf.df2)}) = ${formatStat(bf.F)}, p ${formatP(bf.p)}).`
        : `The groups have similar spread: ${ratioText} (Brown–Forsythe F(${formatDf(bf.df1)}, ${formatDf(bf.df2)}) = ${formatStat(bf.F)}, p ${formatP(bf.p)}).`,
    });
  } else {
    out.push({
      key: "spread",
      level: "attention",
      text: `Equality of spread was not tested: ${reasonOf(bf)}.`,
    });
  }

  const bySize = r.sizeAwareOutliers;
  const o = r.outliers;
  if (bySize && ok(bySize)) {
    out.push({
      key: "outliers",
      level: bySize.groups.some((g) => g.flaggedCount > 0) ? "attention" : "ok",
      text: bySize.summary.text,
    });
  } else if (ok(o)) {
    const rows = o.groups.flatMap((g) => g.extreme.map((v) => `row ${v.row} in ${g.group}`));
    out.push({
      key: "outliers",
      level: o.totalExtreme > 0 ? "attention" : "ok",
      text:
        o.totalExtreme > 0
          ? `${o.totalExtreme} extreme value${o.totalExtreme === 1 ? "" : "s"} beyond 3 IQR of the quartiles (${rows.slice(0, 6).join(", ")}${rows.length > 6 ? ", …" : ""}); check them against the records before trusting a mean-based test.`
          : o.totalMild > 0
            ? `${o.totalMild} value${o.totalMild === 1 ? "" : "s"} beyond 1.5 IQR but none beyond 3 IQR; no extreme outliers.`
            : "No values beyond 1.5 IQR of the quartiles in any group.",
    });
  } else {
    out.push({ key: "outliers", level: "attention", text: `Outliers were not screened: ${reasonOf(o)}.` });
  }
  return out;
}

/** The omnibus result in the usual reporting form, e.g. "F(2, 27) = 4.21, p = .025, ω² = .17". */
export function omnibusSentence(r: ResultView, test: OmnibusTest): string {
  if (test === "anova") {
    const a = r.anova;
    if (!ok(a)) return `Classic one-way ANOVA could not be computed: ${reasonOf(a)}.`;
    const ci = ok(a.etaSquaredCi)
      ? `, η² = ${formatUnit(a.etaSquared)} [95% CI ${formatUnit(a.etaSquaredCi.lower)}, ${formatUnit(a.etaSquaredCi.upper)}]`
      : `, η² = ${formatUnit(a.etaSquared)}`;
    return `F(${formatDf(a.df1)}, ${formatDf(a.df2)}) = ${formatStat(a.F)}, p ${formatP(a.p)}, ω² = ${formatUnit(a.omegaSquared)}${ci}`;
  }
  if (test === "welch") {
    const w = r.welch;
    if (!ok(w)) return `${TEST_TERMS.welch.title} could not be computed: ${reasonOf(w)}.`;
    const a = r.anova;
    const eff = ok(a) ? `, ω² = ${formatUnit(a.omegaSquared)}` : "";
    return `Welch's F(${formatDf(w.df1)}, ${formatDf(w.df2)}) = ${formatStat(w.F)}, p ${formatP(w.p)}${eff}`;
  }
  const k = r.kruskalWallis;
  if (!ok(k)) return `The Kruskal–Wallis test could not be computed: ${reasonOf(k)}.`;
  return `H(${formatDf(k.df)}) = ${formatStat(k.H)}, p ${formatP(k.p)}, ε² = ${formatUnit(k.epsilonSquared)}`;
}

/**
 * A short summary that does not overclaim: what the omnibus test found at α, the effect size
 * in words, and the reminder that significance is not importance.
 */
/** "Compressive strength" reads as "compressive strength" mid-sentence; acronyms such as "pH" or "ALT" stay. */
export function midSentence(name: string): string {
  return name.length > 1 && /^[A-Z][a-z]/.test(name) ? name[0]!.toLowerCase() + name.slice(1) : name;
}

export function resultSummary(r: ResultView, test: OmnibusTest, outcomeName: string): string[] {
  const outcome = midSentence(outcomeName);
  const alpha = r.options.alpha;
  const p = test === "anova" ? r.anova : test === "welch" ? r.welch : r.kruskalWallis;
  const lines: string[] = [];
  const name = TEST_TERMS[test].name;
  if (!ok(p)) return [`${TEST_TERMS[test].title} could not be computed: ${reasonOf(p)}.`];
  const sentence = omnibusSentence(r, test);
  if (p.p < alpha) {
    lines.push(
      `At α = ${formatUnit(alpha)}, ${name} found a difference in ${outcome} between at least two of the groups (${sentence}). The post-hoc comparisons show which pairs differ.`,
    );
  } else {
    lines.push(
      `At α = ${formatUnit(alpha)}, ${name} did not find a difference in ${outcome} between the groups (${sentence}). This is not evidence that the groups are equal: the study may be too small to detect a difference that matters.`,
    );
  }
  lines.push(
    "A small p-value says a difference is unlikely to be chance alone, not that it is large or important: judge the size of the differences and their intervals against what matters in practice.",
  );
  return lines;
}
