import {
  comparisonRows,
  formatP,
  formatStat,
  formatUnit,
  type ComparisonRow,
  type PosthocFamily,
  type PosthocPart,
} from "@waymark/stats";

type Row = Extract<ComparisonRow, { available: true }>;

const pText = (v: number) => formatP(v).replace("= ", "");
const opt = (x: number | undefined, f: (v: number) => string = (v) => formatStat(v)) =>
  x === undefined ? "—" : f(x);
const effect = (r: Row, f: (v: number) => string) => (r.effect.available ? f(r.effect.value) : "—");
const percent = (level: number) =>
  `${formatStat(level * 100, level * 100 === Math.round(level * 100) ? 0 : 1)}%`;

/**
 * The interval cell of one pair; a pair without an interval says why in a numbered note (the
 * stored reason), never with a bare placeholder.
 */
function intervalCell(r: Row, notes: string[]): string {
  if (r.lower !== undefined && r.upper !== undefined)
    return `[${formatStat(r.lower)}, ${formatStat(r.upper)}]`;
  notes.push(`No interval for ${r.a} vs ${r.b}: ${r.intervalReason ?? "the interval was not computed"}.`);
  return `none (note ${notes.length})`;
}

/** Header, rows and notes of the post-hoc table for the analysis's family, or the reason it is missing. */
export function posthocTable(
  posthoc: PosthocPart,
  family: PosthocFamily,
  unit: string,
  alpha = 0.05,
): { header: string[]; rows: string[][]; notes: string[] } | { reason: string } {
  const rows = comparisonRows(posthoc, family);
  if (!Array.isArray(rows)) return { reason: rows.reason };
  const u = unit ? ` (${unit})` : "";
  const notes: string[] = [];
  const ci = `Simultaneous ${percent(1 - alpha)} CI`;
  /** A pair the method could not compute says why in a note instead of a row of dashes. */
  const notComputed = (r: Extract<ComparisonRow, { available: false }>, label: string, width: number) => {
    notes.push(`${r.a} vs ${r.b} was not computed: ${r.reason}.`);
    return [label, `not computed (note ${notes.length})`, ...Array<string>(width - 2).fill("")];
  };
  if (family === "dunn" || family === "dunn-vs-control") {
    return {
      header: ["Comparison", `Shift${u}`, ci, "z", "p (unadjusted)", "Adjusted p", "Rank-biserial r"],
      notes,
      rows: rows.map((r) =>
        r.available
          ? [
              `${r.a} vs ${r.b}`,
              opt(r.shift),
              intervalCell(r, notes),
              opt(r.z),
              opt(r.p, pText),
              pText(r.pAdj),
              effect(r, (v) => formatUnit(v)),
            ]
          : notComputed(r, `${r.a} vs ${r.b}`, 7),
      ),
    };
  }
  return {
    header: ["Comparison", `Difference${u}`, ci, "Adjusted p", "Hedges' g"],
    notes,
    rows: rows.map((r) =>
      r.available
        ? [
            `${r.a} − ${r.b}`,
            opt(r.diff),
            intervalCell(r, notes),
            pText(r.pAdj),
            effect(r, (v) => formatStat(v)),
          ]
        : notComputed(r, `${r.a} − ${r.b}`, 5),
    ),
  };
}

/** Pairs with an interval, for the simultaneous-intervals figure (mean differences, or Hodges–Lehmann shifts for rank comparisons). */
export function intervalPairs(
  posthoc: PosthocPart,
  family: PosthocFamily,
): { label: string; diff: number; lower: number; upper: number }[] {
  const rows = comparisonRows(posthoc, family);
  if (!Array.isArray(rows)) return [];
  return rows.flatMap((r) => {
    const centre = r.available ? (r.diff ?? r.shift) : undefined;
    return r.available && centre !== undefined && r.lower !== undefined && r.upper !== undefined
      ? [{ label: `${r.a} − ${r.b}`, diff: centre, lower: r.lower, upper: r.upper }]
      : [];
  });
}
