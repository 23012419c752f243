import {
  isAvailable,
  isUnavailable,
  num,
  reasonOf,
  type AnalysisResult,
  type ComparisonSet,
  type GroupDescription,
  type PairRow,
  type TestId,
} from "@/features/studies/types";

export interface PairView {
  a: string;
  b: string;
  diff: number | null;
  lower: number | null;
  upper: number | null;
  pAdj: number | null;
  effect: number | null;
}

export interface PosthocView {
  rows: PairView[];
  effectLabel: "d" | "r" | "g";
  effectNote: string;
  hasIntervals: boolean;
}

/** Where the engine keeps the comparisons matched to a test: all pairs by test, or against the control. */
function keyFor(test: TestId, comparisons: ComparisonSet): "tukey" | "gamesHowell" | "dunn" | "control" {
  if (comparisons === "vs-control") return "control";
  return test === "anova" ? "tukey" : test === "welch" ? "gamesHowell" : "dunn";
}

function rowsOf(x: unknown): PairRow[] | null {
  if (Array.isArray(x)) return x as PairRow[];
  if (x && typeof x === "object" && !isUnavailable(x)) {
    const o = x as { comparisons?: unknown; rows?: unknown; pairs?: unknown };
    for (const v of [o.comparisons, o.rows, o.pairs]) if (Array.isArray(v)) return v as PairRow[];
  }
  return null;
}

function groupSd(g: GroupDescription | undefined): number | null {
  return g ? num(g.sd) : null;
}

/**
 * The post-hoc comparisons of the chosen method, with an effect size per pair: the engine's when
 * it sends one (Hedges' g; the rank-biserial r for Dunn's test), otherwise the standardized difference (difference ÷ √MS_within for the pooled
 * methods, ÷ √((s_a² + s_b²)/2) for Games–Howell and Welch t; common practice) or r = z/√N for
 * Dunn's test (Rosenthal 1991). Returns the reason when the comparisons are not available.
 */
export function posthocView(
  test: TestId,
  comparisons: ComparisonSet,
  r: AnalysisResult,
): PosthocView | { unavailable: string } {
  if (!isAvailable(r.posthoc))
    return { unavailable: reasonOf(r.posthoc, "The post-hoc comparisons are missing.") };
  const key = keyFor(test, comparisons);
  let raw = (r.posthoc as Record<string, unknown>)[key];
  if (key === "control" && raw && typeof raw === "object" && !Array.isArray(raw) && !isUnavailable(raw)) {
    const fam = raw as Record<string, unknown>;
    const own = test === "anova" ? fam.dunnett : test === "welch" ? fam.welchHolm : fam.dunn;
    if (own !== undefined) raw = own;
  }
  if (isUnavailable(raw)) return { unavailable: reasonOf(raw) };
  const rows = rowsOf(raw);
  if (!rows) return { unavailable: "The server sent no comparisons for this method." };

  const groups = isAvailable(r.groups) ? r.groups : [];
  const byName = new Map(groups.map((g) => [g.name, g]));
  const totalN = num(r.data?.totalN) ?? groups.reduce((s, g) => s + (num(g.n) ?? 0), 0);
  const msWithin = isAvailable(r.anova) ? num(r.anova.msWithin) : null;
  const rank = test === "kruskal-wallis";
  const separate = test === "welch";

  const gOf = (row: PairRow) =>
    typeof row.hedgesG === "number"
      ? num(row.hedgesG)
      : isAvailable(row.hedgesG) && row.hedgesG
        ? num(row.hedgesG.g)
        : null;
  const rbOf = (row: PairRow) =>
    isAvailable(row.rankBiserial) && row.rankBiserial ? num(row.rankBiserial.r) : null;
  // One kind of effect size per table: the engine's whenever it sent one for any pair.
  const usedG = !rank && rows.some((row) => row.hedgesG !== undefined);
  const usedRankBiserial = rank && rows.some((row) => row.rankBiserial !== undefined);
  const view = rows.map((row): PairView => {
    const diff = num(row.diff);
    let effect: number | null = null;
    const given = isAvailable(row.effectSize) && row.effectSize ? num(row.effectSize.value) : null;
    if (given !== null) effect = given;
    else if (usedG) effect = gOf(row);
    else if (usedRankBiserial) effect = rbOf(row);
    else if (num(row.d) !== null) effect = row.d as number;
    else if (rank) {
      const z = num(row.z);
      effect = z !== null && totalN > 0 ? z / Math.sqrt(totalN) : num(row.r);
    } else if (diff !== null) {
      let scale: number | null = null;
      if (separate) {
        const sa = groupSd(byName.get(row.a));
        const sb = groupSd(byName.get(row.b));
        if (sa !== null && sb !== null) scale = Math.sqrt((sa * sa + sb * sb) / 2);
      } else if (msWithin !== null) scale = Math.sqrt(msWithin);
      effect = scale && scale > 0 ? diff / scale : null;
    }
    return {
      a: String(row.a),
      b: String(row.b),
      diff,
      lower: num(row.lower),
      upper: num(row.upper),
      pAdj: num(row.pAdj) ?? num(row.p),
      effect: effect !== null && Number.isFinite(effect) ? effect : null,
    };
  });
  return {
    rows: view,
    effectLabel: rank ? "r" : usedG ? "g" : "d",
    effectNote: rank
      ? usedRankBiserial
        ? "r: the rank-biserial correlation of the two groups (−1 to 1)."
        : "r = z ÷ √N, the rank-based effect size of each pair."
      : usedG
        ? "g: Hedges' g, the difference over the two groups' pooled SD, corrected for small samples."
        : separate
          ? "d = difference ÷ the root mean square of the two groups' SDs."
          : "d = difference ÷ √MS within, the pooled SD of all groups.",
    hasIntervals: view.some((v) => v.lower !== null && v.upper !== null),
  };
}
