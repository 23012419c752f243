import { isAvailable, num, reasonOf } from "@/lib/result-values";
import type { AnalysisDto as Analysis } from "@waymark/contract";
import type { AnalysisResult } from "@waymark/stats/result";
import type { OmnibusTest as TestId } from "@waymark/stats/vocabulary";

export interface OmnibusNumbers {
  symbol: "F" | "H";
  df: number[];
  stat: number;
  p: number;
  effect: {
    symbol: "ω²" | "ε²" | "η²";
    value: number;
    note?: string;
    ci?: { lower: number; upper: number; level?: number };
  } | null;
  cohensF?: number;
}

/** The chosen test's numbers, or the reason they are missing. Pure; every value is checked finite. */
export function omnibusNumbers(test: TestId, r: AnalysisResult): OmnibusNumbers | { unavailable: string } {
  if (test === "kruskal-wallis") {
    const kw = r.kruskalWallis;
    if (!isAvailable(kw) || num(kw.H) === null || num(kw.df) === null || num(kw.p) === null)
      return { unavailable: reasonOf(kw, "The Kruskal–Wallis result is missing.") };
    const e = num(kw.epsilonSquared);
    return {
      symbol: "H",
      df: [kw.df],
      stat: kw.H,
      p: kw.p,
      effect: e === null ? null : { symbol: "ε²", value: e },
    };
  }
  const part = test === "welch" ? r.welch : r.anova;
  if (
    !isAvailable(part) ||
    num(part.F) === null ||
    num(part.df1) === null ||
    num(part.df2) === null ||
    num(part.p) === null
  )
    return { unavailable: reasonOf(part, "The test result is missing.") };
  const anova = isAvailable(r.anova) ? r.anova : null;
  let effect: OmnibusNumbers["effect"] = null;
  if (test === "welch") {
    const own = num((part as { omegaSquared?: number }).omegaSquared);
    const pooled = num(anova?.omegaSquared);
    if (own !== null) effect = { symbol: "ω²", value: own };
    else if (pooled !== null)
      effect = { symbol: "ω²", value: pooled, note: "from the classic ANOVA's sums of squares" };
  } else {
    const w = num(anova?.omegaSquared);
    const ci =
      anova &&
      isAvailable(anova.etaSquaredCi) &&
      anova.etaSquaredCi &&
      num(anova.etaSquaredCi.lower) !== null &&
      num(anova.etaSquaredCi.upper) !== null
        ? anova.etaSquaredCi
        : undefined;
    const eta = num(anova?.etaSquared);
    if (w !== null) effect = { symbol: "ω²", value: w };
    else if (eta !== null) effect = { symbol: "η²", value: eta, ci };
  }
  const cf = num(anova?.cohensF);
  return {
    symbol: "F",
    df: [part.df1, part.df2],
    stat: part.F,
    p: part.p,
    effect,
    ...(cf !== null ? { cohensF: cf } : {}),
  };
}

/** η² with its interval, when the engine computed one (shown beside ω²). */
export function etaSquaredWithCi(
  r: AnalysisResult,
): { value: number; lower: number; upper: number; level?: number } | null {
  const a = isAvailable(r.anova) ? r.anova : null;
  if (!a) return null;
  const eta = num(a.etaSquared);
  const ci = a.etaSquaredCi;
  if (eta === null || !isAvailable(ci) || !ci || num(ci.lower) === null || num(ci.upper) === null)
    return null;
  return { value: eta, lower: ci.lower, upper: ci.upper, level: num(ci.level) ?? undefined };
}

export function isSignificant(analysis: Analysis, alpha: number): boolean | null {
  const o = omnibusNumbers(analysis.chosenTest, analysis.result);
  return "unavailable" in o ? null : o.p < alpha;
}
