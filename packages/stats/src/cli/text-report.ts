import type { Unavailable } from "../types/group-summary.js";
import { isAvailable, reasonOf, type AnalysisResult } from "../types/analysis-result.js";
import { formatP } from "../reporting/format.js";
import { errorRateSentences, sensitivitySentences } from "../reporting/choice-sentences.js";
import { CHECK_TERMS, POSTHOC_TERMS, TEST_TERMS } from "../vocabulary/names.js";

function why(x: Unavailable | unknown): string {
  return `not available: ${reasonOf(x, "no reason given")}`;
}

/** "Largest SD / smallest SD" → "largest SD / smallest SD": only the first letter changes. */
const lowerFirst = (s: string) => s.charAt(0).toLowerCase() + s.slice(1);

/** A number with about four significant digits, plain for ordinary magnitudes. */
function num(x: unknown, digits = 4): string {
  if (typeof x !== "number") return "—";
  if (x === 0) return "0";
  const a = Math.abs(x);
  if (a >= 1e7 || a < 1e-4) return x.toExponential(digits - 1);
  return String(Number(x.toPrecision(digits)));
}

/** p as everywhere else in Waymark (the shared formatter): "= .025", "< .001". */
function pval(x: unknown): string {
  return typeof x === "number" ? formatP(x) : "—";
}

/** Left-aligned first column, right-aligned others, two spaces between. */
function table(head: string[], rows: string[][]): string[] {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length)));
  const line = (cells: string[]) =>
    "  " + cells.map((c, i) => (i === 0 ? c.padEnd(widths[i] ?? 0) : c.padStart(widths[i] ?? 0))).join("  ");
  return [line(head), ...rows.map(line)];
}

/**
 * The command line's plain-text report: the recommendation first (what to run and why), then
 * the groups, the three omnibus tests side by side, the checks, pairwise comparisons and any
 * warnings. Our own layout; every figure comes from the JSON result unchanged.
 * Example: textReport(analyze(...), { group: "Orchard row", outcome: "Fruit mass (kg)" }).
 * Cost: O(k² + output size).
 */
export function textReport(
  result: AnalysisResult,
  labels: { group: string; outcome: string; file?: string },
): string {
  const out: string[] = [];
  const k = result.groups.length;
  out.push(
    `${labels.outcome} compared across ${k} groups of ${labels.group}${labels.file ? ` (${labels.file})` : ""}`,
  );
  out.push(
    `${result.data.totalN} values used, ${result.data.totalMissing} missing; α = ${result.options.alpha}; engine ${result.engineVersion}`,
  );
  out.push("");

  const rec = result.recommendation;
  out.push(
    rec.test === "out-of-scope"
      ? "Primary test: none (the design is outside this analysis)"
      : `Primary test, from the design answers: ${TEST_TERMS[rec.test].name}${rec.posthoc !== "none" ? `, followed by ${POSTHOC_TERMS[rec.posthoc].name}` : ""}${rec.computable ? "" : " (cannot be computed on these data)"}`,
  );
  for (const r of rec.reasons) out.push(`  - ${r.text}`);
  if (rec.caveats.length) {
    out.push("  Keep in mind:");
    for (const c of rec.caveats) out.push(`  - ${c.text}`);
  }
  if (result.checkWarnings.length) {
    out.push("  What the checks say about it:");
    for (const w of result.checkWarnings) out.push(`  - ${w.text}`);
  }
  for (const line of sensitivitySentences(result.sensitivity)) out.push(`  - ${line}`);
  out.push("  Error-rate check:");
  for (const line of errorRateSentences(result.errorRateCheck, rec.test)) out.push(`  - ${line}`);
  out.push("");

  out.push("Groups");
  out.push(
    ...table(
      ["group", "n", "missing", "mean", "sd", "95% CI of mean", "median", "IQR", "min", "max"],
      result.groups.map((g) => [
        g.name,
        String(g.n),
        String(g.missing),
        num(g.mean),
        num(g.sd),
        typeof g.ciLower === "number" && typeof g.ciUpper === "number"
          ? `${num(g.ciLower)} to ${num(g.ciUpper)}`
          : "—",
        num(g.median),
        num(g.iqr),
        num(g.min),
        num(g.max),
      ]),
    ),
  );
  out.push("");

  out.push("Is there a difference?");
  const a = result.anova;
  const w = result.welch;
  const kw = result.kruskalWallis;
  const label = (t: keyof typeof TEST_TERMS) => TEST_TERMS[t].short.padEnd(16);
  out.push(
    isAvailable(a)
      ? `  ${label("anova")} F = ${num(a.F)} on ${a.df1} and ${a.df2} df, p ${pval(a.p)}; eta² ${num(a.etaSquared, 3)}${isAvailable(a.etaSquaredCi) ? ` (95% CI ${num(a.etaSquaredCi.lower, 3)} to ${num(a.etaSquaredCi.upper, 3)})` : ""}, omega² ${num(a.omegaSquared, 3)}, Cohen's f ${num(a.cohensF, 3)}`
      : `  ${label("anova")} ${why(a)}`,
  );
  out.push(
    isAvailable(w)
      ? `  ${label("welch")} F = ${num(w.F)} on ${w.df1} and ${num(w.df2)} df, p ${pval(w.p)}`
      : `  ${label("welch")} ${why(w)}`,
  );
  if (isAvailable(kw)) {
    const perm = kw.permutation;
    out.push(
      `  ${label("kruskal-wallis")} H = ${num(kw.H)} on ${kw.df} df, p ${pval(kw.p)}; epsilon² ${num(kw.epsilonSquared, 3)}${perm ? `; permutation p ${pval(perm.p)} (${perm.iterations} shuffles, seed ${perm.seed})` : ""}`,
    );
  } else out.push(`  ${label("kruskal-wallis")} ${why(kw)}`);
  out.push("");

  out.push("Checks");
  // Normality per group (W is the same on a group's values and its standardized residuals);
  // residuals pooled across groups mix spread with shape, so they are not read here.
  const sw = result.shapiroWilk;
  out.push(
    `  normality within each group (${CHECK_TERMS["shapiro-wilk"].short}): ${sw.map((s) => `${s.group} ${s.available !== false ? `W = ${num(s.W)}, p ${pval(s.p)}` : "not computed"}`).join("; ")}`,
  );
  if (isAvailable(result.groupNormality)) out.push(`    ${result.groupNormality.summary.text}`);
  for (const [label, x] of [
    [`equal variances, ${CHECK_TERMS.levene.title}`, result.levene],
    [`equal variances, ${CHECK_TERMS["brown-forsythe"].title}`, result.brownForsythe],
  ] as const) {
    out.push(
      `  ${label}: ${isAvailable(x) ? `F = ${num(x.F)} on ${x.df1} and ${x.df2} df, p ${pval(x.p)}` : why(x)}`,
    );
  }
  const b = result.bartlett;
  out.push(
    `  equal variances, ${CHECK_TERMS.bartlett.title}: ${isAvailable(b) ? `statistic ${num(b.statistic)} on ${b.df} df, p ${pval(b.p)}` : why(b)}`,
  );
  out.push(
    `  ${lowerFirst(CHECK_TERMS["sd-ratio"].title)}: ${typeof result.sdRatio === "number" ? num(result.sdRatio, 3) : why(result.sdRatio)}`,
  );
  const o = result.outliers;
  if (isAvailable(o)) {
    out.push(
      `  outliers: ${o.totalMild} beyond 1.5 IQR, ${o.totalExtreme} beyond 3 IQR, ${o.totalLargeResidual} with |studentized residual| > 3`,
    );
  }
  if (isAvailable(result.sizeAwareOutliers)) out.push(`    ${result.sizeAwareOutliers.summary.text}`);
  out.push("");

  const ph = result.posthoc;
  out.push("Pairwise comparisons");
  const interval = (x: { diff: number; lower: number; upper: number; pAdj: number }) => [
    num(x.diff),
    `${num(x.lower)} to ${num(x.upper)}`,
    pval(x.pAdj),
  ];
  const family = <P extends { a: string; b: string }>(
    title: string,
    pairs: P[] | Unavailable,
    head: string[],
    cells: (x: P) => string[],
  ) => {
    if (!Array.isArray(pairs)) {
      out.push(`  ${title}: ${why(pairs)}`);
      return;
    }
    out.push(`  ${title}`);
    out.push(
      ...table(
        head,
        pairs.map((x) => [`${x.a} − ${x.b}`, ...cells(x)]),
      ).map((l) => "  " + l),
    );
  };
  const intervalHead = ["pair", "difference", "interval", "p adjusted"];
  family(`${POSTHOC_TERMS["tukey-kramer"].short} (pooled variance)`, ph.tukey, intervalHead, interval);
  family(`${POSTHOC_TERMS["games-howell"].short} (separate variances)`, ph.gamesHowell, intervalHead, (x) =>
    x.available ? interval(x) : ["—", `not available: ${x.reason}`, "—"],
  );
  family(`${POSTHOC_TERMS.dunn.short} (ranks, two-sided)`, ph.dunn, ["pair", "z", "p", "p adjusted"], (x) => [
    num(x.z),
    pval(x.p),
    pval(x.pAdj),
  ]);
  if (result.warnings.length) {
    out.push("");
    out.push("Warnings");
    for (const wline of result.warnings) out.push(`  - ${wline}`);
  }
  return out.join("\n") + "\n";
}
