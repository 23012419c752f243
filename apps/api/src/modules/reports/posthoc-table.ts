import { formatP, formatStat, formatUnit } from "@waymark/stats";

type Pair = Record<string, unknown>;

const num = (x: unknown): number | null => (typeof x === "number" && Number.isFinite(x) ? x : null);
/** Effect sizes arrive as a number or as { g } / { r } objects with their details. */
const effect = (x: unknown, key: "g" | "r"): unknown =>
  x && typeof x === "object" && key in x ? (x as Record<string, unknown>)[key] : x;

const fmt = (x: unknown, f: (v: number) => string = (v) => formatStat(v)) => {
  const v = num(x);
  return v === null ? "—" : f(v);
};

/** The pairs of one post-hoc family, whether stored as an array or as { pairs }. */
function pairsOf(family: unknown): Pair[] | null {
  if (Array.isArray(family)) return family as Pair[];
  if (family && typeof family === "object" && Array.isArray((family as { pairs?: unknown }).pairs))
    return (family as { pairs: Pair[] }).pairs;
  return null;
}

export function familyFor(
  posthoc: Record<string, unknown>,
  chosenTest: string,
  vsControl: boolean,
): { key: string; family: unknown } {
  if (vsControl && posthoc.control) {
    const c = posthoc.control as Record<string, unknown>;
    const key = chosenTest === "anova" ? "dunnett" : chosenTest === "welch" ? "welchHolm" : "dunn";
    if (c[key]) return { key: `control.${key}`, family: c[key] };
    return { key: "control", family: c };
  }
  const key = chosenTest === "anova" ? "tukey" : chosenTest === "welch" ? "gamesHowell" : "dunn";
  return { key, family: posthoc[key] };
}

const percent = (level: number) =>
  `${formatStat(level * 100, level * 100 === Math.round(level * 100) ? 0 : 1)}%`;

/**
 * The interval cell of one pair; a pair without an interval says so in a note (the stored
 * reason), never with a bare placeholder.
 */
function intervalCell(p: Pair, notes: string[]): string {
  const lower = num(p.lower);
  const upper = num(p.upper);
  if (lower !== null && upper !== null) return `[${formatStat(lower)}, ${formatStat(upper)}]`;
  const stated = p.intervalReason ?? p.reason;
  const reason = typeof stated === "string" ? stated : "the interval was not computed";
  notes.push(`No interval for ${p.a} vs ${p.b}: ${reason}.`);
  return `none (note ${notes.length})`;
}

/** Header and rows of the post-hoc table for the chosen test, or the reason it is missing. */
export function posthocTable(
  posthoc: Record<string, unknown>,
  chosenTest: string,
  vsControl: boolean,
  unit: string,
  alpha = 0.05,
): { header: string[]; rows: string[][]; notes: string[] } | { reason: string } {
  const { family } = familyFor(posthoc, chosenTest, vsControl);
  const pairs = pairsOf(family);
  if (!pairs) {
    const reason =
      family && typeof family === "object" && "reason" in family
        ? String((family as { reason: unknown }).reason)
        : "the comparisons were not computed";
    return { reason };
  }
  const u = unit ? ` (${unit})` : "";
  const notes: string[] = [];
  /** A pair the method could not compute says why in a note instead of a row of dashes. */
  const unavailable = (p: Pair, label: string, width: number): string[] | null => {
    if (p.available !== false) return null;
    notes.push(
      `${p.a} vs ${p.b} was not computed: ${typeof p.reason === "string" ? p.reason : "no reason was recorded"}.`,
    );
    return [label, `not computed (note ${notes.length})`, ...Array<string>(width - 2).fill("")];
  };
  const ci = `Simultaneous ${percent(1 - alpha)} CI`;
  if (chosenTest === "kruskal-wallis") {
    return {
      header: ["Comparison", `Shift${u}`, ci, "z", "p (unadjusted)", "Adjusted p", "Rank-biserial r"],
      notes,
      rows: pairs.map(
        (p) =>
          unavailable(p, `${p.a} vs ${p.b}`, 7) ?? [
            `${p.a} vs ${p.b}`,
            fmt(p.shift),
            intervalCell(p, notes),
            fmt(p.z),
            fmt(p.p, (v) => formatP(v).replace("= ", "")),
            fmt(p.pAdj, (v) => formatP(v).replace("= ", "")),
            fmt(effect(p.rankBiserial, "r"), (v) => formatUnit(v)),
          ],
      ),
    };
  }
  return {
    header: ["Comparison", `Difference${u}`, ci, "Adjusted p", "Hedges' g"],
    notes,
    rows: pairs.map(
      (p) =>
        unavailable(p, `${p.a} − ${p.b}`, 5) ?? [
          `${p.a} − ${p.b}`,
          fmt(p.diff),
          intervalCell(p, notes),
          fmt(p.pAdj, (v) => formatP(v).replace("= ", "")),
          fmt(effect(p.hedgesG, "g")),
        ],
    ),
  };
}

/** Pairs with an interval, for the simultaneous-intervals figure (mean differences, or Hodges–Lehmann shifts for rank comparisons). */
export function intervalPairs(
  posthoc: Record<string, unknown>,
  chosenTest: string,
  vsControl: boolean,
): { label: string; diff: number; lower: number; upper: number }[] {
  const pairs = pairsOf(familyFor(posthoc, chosenTest, vsControl).family) ?? [];
  return pairs
    .map((p): Pair & { diff: number | null } => ({ ...p, diff: num(p.diff) ?? num(p.shift) }))
    .filter((p) => p.diff !== null && num(p.lower) !== null && num(p.upper) !== null)
    .map((p) => ({
      label: `${p.a} − ${p.b}`,
      diff: p.diff as number,
      lower: p.lower as number,
      upper: p.upper as number,
    }));
}
