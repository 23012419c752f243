import type { AnalysisResult } from "../analyze.js";
import { formatP } from "../reporting/format.js";

type Rec = Record<string, unknown>;

function isOk(x: unknown): x is Rec {
  return typeof x === "object" && x !== null && (x as Rec).available !== false;
}

function why(x: unknown): string {
  return typeof x === "object" && x !== null && typeof (x as Rec).reason === "string"
    ? `not available: ${(x as Rec).reason as string}`
    : "not available";
}

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

const POSTHOC_NAMES: Record<string, string> = {
  "tukey-kramer": "Tukey–Kramer comparisons of all pairs",
  "games-howell": "Games–Howell comparisons of all pairs",
  dunn: "Dunn's rank comparisons of all pairs",
  dunnett: "Dunnett's comparisons with the control",
  "welch-vs-control-holm": "Welch t tests against the control (Holm-adjusted)",
  "dunn-vs-control": "Dunn's rank comparisons with the control",
};

const TEST_NAMES: Record<string, string> = {
  anova: "classic one-way ANOVA",
  welch: "Welch's ANOVA",
  "kruskal-wallis": "Kruskal–Wallis test",
  "out-of-scope": "outside this analysis",
};

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
    `Primary test, from the design answers: ${TEST_NAMES[rec.test] ?? rec.test}${rec.posthoc !== "none" ? `, followed by ${POSTHOC_NAMES[rec.posthoc] ?? rec.posthoc}` : ""}${rec.computable || rec.test === "out-of-scope" ? "" : " (cannot be computed on these data)"}`,
  );
  for (const r of rec.reasons) out.push(`  - ${r.text}`);
  if (rec.caveats.length) {
    out.push("  Keep in mind:");
    for (const c of rec.caveats) out.push(`  - ${c.text}`);
  }
  if ("entries" in result.sensitivity) {
    out.push("  Sensitivity analyses:");
    for (const n of result.sensitivity.notes) out.push(`  - ${n.text}`);
  }
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
  const a = result.anova as Rec;
  const w = result.welch as Rec;
  const kw = result.kruskalWallis as Rec;
  out.push(
    isOk(a)
      ? `  classic ANOVA    F = ${num(a.F)} on ${a.df1} and ${a.df2} df, p ${pval(a.p)}; eta² ${num(a.etaSquared, 3)}${isOk(a.etaSquaredCi) ? ` (95% CI ${num((a.etaSquaredCi as Rec).lower, 3)} to ${num((a.etaSquaredCi as Rec).upper, 3)})` : ""}, omega² ${num(a.omegaSquared, 3)}, Cohen's f ${num(a.cohensF, 3)}`
      : `  classic ANOVA    ${why(a)}`,
  );
  out.push(
    isOk(w)
      ? `  Welch's ANOVA    F = ${num(w.F)} on ${w.df1} and ${num(w.df2)} df, p ${pval(w.p)}`
      : `  Welch's ANOVA    ${why(w)}`,
  );
  if (isOk(kw)) {
    const perm = kw.permutation as Rec | undefined;
    out.push(
      `  Kruskal–Wallis   H = ${num(kw.H)} on ${kw.df} df, p ${pval(kw.p)}; epsilon² ${num(kw.epsilonSquared, 3)}${perm ? `; permutation p ${pval(perm.p)} (${perm.iterations} shuffles, seed ${perm.seed})` : ""}`,
    );
  } else out.push(`  Kruskal–Wallis   ${why(kw)}`);
  out.push("");

  out.push("Checks");
  const sw = result.shapiroWilk as Rec[];
  const swr = result.shapiroWilkResiduals as Rec;
  out.push(
    `  normality of residuals (Shapiro–Wilk): ${isOk(swr) ? `W = ${num(swr.W)}, p ${pval(swr.p)}` : why(swr)}`,
  );
  out.push(
    `  per group: ${sw.map((s) => `${String(s.group)} ${isOk(s) ? `W = ${num(s.W)}, p ${pval(s.p)}` : "n/a"}`).join("; ")}`,
  );
  for (const [label, x] of [
    ["equal variances, Levene (mean-centred)", result.levene],
    ["equal variances, Brown–Forsythe (median-centred)", result.brownForsythe],
  ] as const) {
    const t = x as Rec;
    out.push(
      `  ${label}: ${isOk(t) ? `F = ${num(t.F)} on ${t.df1} and ${t.df2} df, p ${pval(t.p)}` : why(t)}`,
    );
  }
  const b = result.bartlett as Rec;
  out.push(
    `  equal variances, Bartlett: ${isOk(b) ? `statistic ${num(b.statistic)} on ${b.df} df, p ${pval(b.p)}` : why(b)}`,
  );
  out.push(
    `  largest SD / smallest SD: ${typeof result.sdRatio === "number" ? num(result.sdRatio, 3) : why(result.sdRatio)}`,
  );
  const o = result.outliers as Rec;
  if (isOk(o)) {
    out.push(
      `  outliers: ${o.totalMild} beyond 1.5 IQR, ${o.totalExtreme} beyond 3 IQR, ${o.totalLargeResidual} with |studentized residual| > 3`,
    );
  }
  out.push("");

  const ph = result.posthoc as Rec;
  const families: [string, string, (x: Rec) => string[]][] = [
    [
      "tukey",
      "Tukey–Kramer (pooled variance)",
      (x) => [num(x.diff), `${num(x.lower)} to ${num(x.upper)}`, pval(x.pAdj)],
    ],
    [
      "gamesHowell",
      "Games–Howell (separate variances)",
      (x) => [num(x.diff), `${num(x.lower)} to ${num(x.upper)}`, pval(x.pAdj)],
    ],
    ["dunn", "Dunn (ranks, two-sided)", (x) => [num(x.z), pval(x.p), pval(x.pAdj)]],
  ];
  out.push("Pairwise comparisons");
  for (const [key, title, cells] of families) {
    const fam = ph[key];
    if (!Array.isArray(fam)) {
      out.push(`  ${title}: ${why(fam)}`);
      continue;
    }
    out.push(`  ${title}`);
    const head =
      key === "dunn" ? ["pair", "z", "p", "p adjusted"] : ["pair", "difference", "interval", "p adjusted"];
    out.push(
      ...table(
        head,
        (fam as Rec[]).map((x) => [`${String(x.a)} − ${String(x.b)}`, ...cells(x)]),
      ).map((l) => "  " + l),
    );
  }
  if (result.warnings.length) {
    out.push("");
    out.push("Warnings");
    for (const wline of result.warnings) out.push(`  - ${wline}`);
  }
  return out.join("\n") + "\n";
}
