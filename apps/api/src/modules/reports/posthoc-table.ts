import {
  comparisonRows,
  formatP,
  formatStat,
  formatUnit,
  type ComparisonRow,
  type PosthocFamily,
  type PosthocPart,
} from "@waymark/stats";

const pText = (v: number) => formatP(v).replace("= ", "");
const opt = (x: number | undefined, f: (v: number) => string = (v) => formatStat(v)) =>
  x === undefined ? "—" : f(x);
const effect = (r: Extract<ComparisonRow, { available: true }>, f: (v: number) => string) =>
  r.effect.available ? f(r.effect.value) : "—";

/** Header and rows of the post-hoc table for the analysis's family, or the reason it is missing. */
export function posthocTable(
  posthoc: PosthocPart,
  family: PosthocFamily,
  unit: string,
): { header: string[]; rows: string[][] } | { reason: string } {
  const rows = comparisonRows(posthoc, family);
  if (!Array.isArray(rows)) return { reason: rows.reason };
  const u = unit ? ` (${unit})` : "";
  if (family === "dunn" || family === "dunn-vs-control") {
    return {
      header: ["Comparison", "z", "p (unadjusted)", "Adjusted p", "Rank-biserial r"],
      rows: rows.map((r) =>
        r.available
          ? [`${r.a} vs ${r.b}`, opt(r.z), opt(r.p, pText), pText(r.pAdj), effect(r, (v) => formatUnit(v))]
          : [`${r.a} vs ${r.b}`, "—", "—", "—", "—"],
      ),
    };
  }
  return {
    header: ["Comparison", `Difference${u}`, "95% CI", "Adjusted p", "Hedges' g"],
    rows: rows.map((r) =>
      r.available
        ? [
            `${r.a} − ${r.b}`,
            opt(r.diff),
            r.lower !== undefined && r.upper !== undefined
              ? `[${formatStat(r.lower)}, ${formatStat(r.upper)}]`
              : "—",
            pText(r.pAdj),
            effect(r, (v) => formatStat(v)),
          ]
        : [`${r.a} − ${r.b}`, "—", "—", "—", "—"],
    ),
  };
}

/** Pairs with an interval, for the simultaneous-intervals figure. */
export function intervalPairs(
  posthoc: PosthocPart,
  family: PosthocFamily,
): { label: string; diff: number; lower: number; upper: number }[] {
  const rows = comparisonRows(posthoc, family);
  if (!Array.isArray(rows)) return [];
  return rows.flatMap((r) =>
    r.available && r.diff !== undefined && r.lower !== undefined && r.upper !== undefined
      ? [{ label: `${r.a} − ${r.b}`, diff: r.diff, lower: r.lower, upper: r.upper }]
      : [],
  );
}
