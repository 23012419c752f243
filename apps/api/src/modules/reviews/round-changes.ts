import { formatP, formatStat, formatUnit, testName } from "@waymark/stats";

/** What a review round froze, as far as "what changed" needs it. */
export interface RoundRecord {
  round: number;
  analysisId: number;
  datasetVersion: number;
  chosenTest: string;
  posthocMethod: string;
  /** a departure from the plan or recommendation, with its written reason; null when none */
  deviation: string | null;
  result: unknown;
}

export interface KeyNumber {
  name: string;
  before: string | null;
  after: string | null;
}

export interface RoundChanges {
  sinceRound: number;
  dataVersion: { before: number; after: number; changed: boolean };
  test: { before: string; after: string; changed: boolean };
  posthoc: { before: string; after: string; changed: boolean };
  deviation: { before: string | null; after: string | null; changed: boolean };
  keyNumbers: KeyNumber[];
  /** one plain sentence per change, or one saying nothing changed */
  summary: string[];
}

const num = (x: unknown): number | null => (typeof x === "number" && Number.isFinite(x) ? x : null);
const part = (result: unknown, key: string): Record<string, unknown> =>
  ((result as Record<string, unknown> | null)?.[key] as Record<string, unknown> | undefined) ?? {};

/** The omnibus statistic, its p-value and effect size of a stored result, formatted as reported. */
function keyNumbersOf(r: RoundRecord): Record<string, string | null> {
  const kw = r.chosenTest === "kruskal-wallis";
  const omni = part(r.result, kw ? "kruskalWallis" : r.chosenTest === "welch" ? "welch" : "anova");
  const stat = num(kw ? omni.H : omni.F);
  const p = num(omni.p);
  const effect = kw ? num(omni.epsilonSquared) : num(part(r.result, "anova").etaSquared);
  const groups = ((r.result as { groups?: { n?: unknown }[] } | null)?.groups ?? []).map(
    (g) => num(g.n) ?? 0,
  );
  return {
    [kw ? "H" : "F"]: stat === null ? null : formatStat(stat),
    p: p === null ? null : formatP(p).replace("= ", ""),
    [kw ? "ε²" : "η²"]: effect === null ? null : formatUnit(effect),
    "values analysed": groups.length ? String(groups.reduce((s, n) => s + n, 0)) : null,
  };
}

/**
 * What changed between two review rounds: the data version, the test, the post-hoc family, any
 * deviation and the key numbers, with a sentence for each change, so the reviewer of round 2
 * onwards sees at once what to look at again. Pure.
 */
export function roundChanges(before: RoundRecord, after: RoundRecord): RoundChanges {
  const kb = keyNumbersOf(before);
  const ka = keyNumbersOf(after);
  const names = [...new Set([...Object.keys(kb), ...Object.keys(ka)])];
  const keyNumbers = names.map((name) => ({ name, before: kb[name] ?? null, after: ka[name] ?? null }));
  const summary: string[] = [];
  if (before.datasetVersion !== after.datasetVersion)
    summary.push(`Data version ${before.datasetVersion} → ${after.datasetVersion}.`);
  if (before.chosenTest !== after.chosenTest)
    summary.push(`Test: ${testName(before.chosenTest)} → ${testName(after.chosenTest)}.`);
  if (before.posthocMethod !== after.posthocMethod)
    summary.push(`Post-hoc comparisons: ${before.posthocMethod} → ${after.posthocMethod}.`);
  if (before.deviation !== after.deviation)
    summary.push(
      after.deviation === null
        ? "The deviation recorded in the last round is gone."
        : before.deviation === null
          ? `New deviation: “${after.deviation}”`
          : `Deviation changed to: “${after.deviation}”`,
    );
  const moved = keyNumbers.filter((k) => k.before !== k.after);
  if (moved.length)
    summary.push(
      `Key numbers: ${moved.map((k) => `${k.name} ${k.before ?? "not computed"} → ${k.after ?? "not computed"}`).join("; ")}.`,
    );
  if (summary.length === 0) summary.push(`Nothing in the analysis changed since round ${before.round}.`);
  return {
    sinceRound: before.round,
    dataVersion: {
      before: before.datasetVersion,
      after: after.datasetVersion,
      changed: before.datasetVersion !== after.datasetVersion,
    },
    test: {
      before: before.chosenTest,
      after: after.chosenTest,
      changed: before.chosenTest !== after.chosenTest,
    },
    posthoc: {
      before: before.posthocMethod,
      after: after.posthocMethod,
      changed: before.posthocMethod !== after.posthocMethod,
    },
    deviation: {
      before: before.deviation,
      after: after.deviation,
      changed: before.deviation !== after.deviation,
    },
    keyNumbers,
    summary,
  };
}
