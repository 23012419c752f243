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

/** Header and rows of the post-hoc table for the chosen test, or the reason it is missing. */
export function posthocTable(
  posthoc: Record<string, unknown>,
  chosenTest: string,
  vsControl: boolean,
  unit: string,
): { header: string[]; rows: string[][] } | { reason: string } {
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
  if (chosenTest === "kruskal-wallis") {
    return {
      header: ["Comparison", "z", "p (unadjusted)", "Adjusted p", "Rank-biserial r"],
      rows: pairs.map((p) => [
        `${p.a} vs ${p.b}`,
        fmt(p.z),
        fmt(p.p, (v) => formatP(v).replace("= ", "")),
        fmt(p.pAdj, (v) => formatP(v).replace("= ", "")),
        fmt(effect(p.rankBiserial, "r"), (v) => formatUnit(v)),
      ]),
    };
  }
  return {
    header: ["Comparison", `Difference${u}`, "95% CI", "Adjusted p", "Hedges' g"],
    rows: pairs.map((p) => [
      `${p.a} − ${p.b}`,
      fmt(p.diff),
      num(p.lower) !== null && num(p.upper) !== null
        ? `[${formatStat(num(p.lower)!)}, ${formatStat(num(p.upper)!)}]`
        : "—",
      fmt(p.pAdj, (v) => formatP(v).replace("= ", "")),
      fmt(effect(p.hedgesG, "g")),
    ]),
  };
}

/** Pairs with an interval, for the simultaneous-intervals figure. */
export function intervalPairs(
  posthoc: Record<string, unknown>,
  chosenTest: string,
  vsControl: boolean,
): { label: string; diff: number; lower: number; upper: number }[] {
  const pairs = pairsOf(familyFor(posthoc, chosenTest, vsControl).family) ?? [];
  return pairs
    .filter((p) => num(p.diff) !== null && num(p.lower) !== null && num(p.upper) !== null)
    .map((p) => ({
      label: `${p.a} − ${p.b}`,
      diff: p.diff as number,
      lower: p.lower as number,
      upper: p.upper as number,
    }));
}
