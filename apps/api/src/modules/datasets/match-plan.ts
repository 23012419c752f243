import { z } from "zod";
import { HttpError } from "../../http/errors.js";
import type { ExtractedGroups, ValidationReport } from "./extract-groups.js";

/**
 * Whether an upload matches the locked plan's levels: every planned level present with at
 * least two values, and no group in the file that the plan does not name (nothing dropped
 * silently). Names that differ from a planned level only in case, spacing, punctuation or
 * accents are offered for mapping; the analyst sends `levelMap` ({"file name": "planned
 * level"}) with the upload to use them; mapping a name to null leaves that group out on
 * purpose, and the report says so. Pure.
 */

/** The mapping the analyst confirms: a name in the file → the planned level it means, or null to leave it out. */
export const levelMapSchema = z.record(z.string().max(200), z.string().max(200).nullable()).default({});
export type LevelMap = z.infer<typeof levelMapSchema>;

/** levelMap arrives as a JSON text field of the multipart upload (or absent). */
export function parseLevelMap(raw: unknown): LevelMap {
  if (raw === undefined || raw === "") return {};
  let value: unknown = raw;
  if (typeof raw === "string") {
    try {
      value = JSON.parse(raw);
    } catch {
      throw new HttpError(
        400,
        "validation_failed",
        'levelMap: must be JSON such as {"sealed dock": "Sealed Dock"}',
      );
    }
  }
  const parsed = levelMapSchema.safeParse(value);
  if (!parsed.success)
    throw new HttpError(
      400,
      "validation_failed",
      'levelMap: must map names in the file to planned levels, e.g. {"sealed dock": "Sealed Dock"}',
    );
  return parsed.data;
}

/** Case, spacing, punctuation and accents removed: "Sealed  Dock!" and "sealed dock" agree. */
export function levelKey(name: string): string {
  return name
    .normalize("NFKD")
    .replace(/\p{M}/gu, "")
    .toLowerCase()
    .replace(/[\p{P}\p{S}\s]+/gu, " ")
    .trim();
}

export interface LevelSuggestion {
  found: string;
  planned: string;
}

export interface PlanMatch {
  matches: boolean;
  missing: string[];
  tooSmall: { level: string; n: number }[];
  unplanned: string[];
  suggestions: LevelSuggestion[];
}

/** The levels to read from the file: the plan's, plus the file names the analyst mapped. */
export function levelsToRead(planned: readonly string[], map: LevelMap): string[] {
  return [...new Set([...planned, ...Object.keys(map).filter((k) => map[k] !== null)])];
}

/**
 * Renames mapped groups to their planned level (merging with any rows already under it) and
 * brings the report's group lists up to date. A mapping to a level the plan lacks is refused.
 */
export function applyLevelMap(
  data: ExtractedGroups,
  report: ValidationReport,
  planned: readonly string[],
  map: LevelMap,
): { data: ExtractedGroups; report: ValidationReport } {
  if (Object.keys(map).length === 0) return { data, report };
  const entries = Object.entries(map).filter((e): e is [string, string] => e[1] !== null);
  const leftOut = Object.keys(map).filter((k) => map[k] === null);
  for (const [from, to] of entries)
    if (!planned.includes(to))
      throw new HttpError(
        400,
        "validation_failed",
        `levelMap: "${from}" is mapped to "${to}", which is not one of the plan's levels (${planned.map((p) => `"${p}"`).join(", ")})`,
      );
  const merged = new Map<string, { values: string[]; rows: number[] }>();
  for (const g of data.groups) {
    const name = (g.name in map ? map[g.name] : null) ?? g.name;
    const into = merged.get(name) ?? { values: [], rows: [] };
    into.values.push(...g.values);
    into.rows.push(...g.rows);
    merged.set(name, into);
  }
  const order = [
    ...planned.filter((l) => merged.has(l)),
    ...[...merged.keys()].filter((k) => !planned.includes(k)),
  ];
  const groups = order.map((name) => ({ name, ...merged.get(name)! }));
  return {
    data: { groups },
    report: {
      ...report,
      groupsFound: groups.map((g) => ({ name: g.name, n: g.values.length })),
      missingLevels: planned.filter((l) => !merged.has(l)),
      messages: [
        ...report.messages,
        ...entries.map(([from, to]) => `Read "${from}" as the planned level "${to}".`),
        ...leftOut
          .filter((l) => report.unknownLevels.includes(l))
          .map((l) => `Left out "${l}" at the analyst's request: the plan does not name it.`),
      ],
    },
  };
}

/** Compares what the file holds with the plan's levels. */
export function matchPlan(
  report: ValidationReport,
  planned: readonly string[],
  /** names the analyst chose to leave out (levelMap to null) */
  leftOut: readonly string[] = [],
): PlanMatch {
  const found = new Map(report.groupsFound.map((g) => [g.name, g.n]));
  const missing = planned.filter((l) => !found.has(l));
  const tooSmall = planned
    .filter((l) => found.has(l) && (found.get(l) as number) < 2)
    .map((level) => ({ level, n: found.get(level) as number }));
  const unplanned = [
    ...new Set([
      ...report.unknownLevels,
      ...report.groupsFound.map((g) => g.name).filter((n) => !planned.includes(n)),
    ]),
  ].filter((n) => !leftOut.includes(n));
  const byKey = new Map(missing.map((m) => [levelKey(m), m]));
  const suggestions = unplanned
    .filter((u) => byKey.has(levelKey(u)))
    .map((u) => ({ found: u, planned: byKey.get(levelKey(u)) as string }));
  return {
    matches: missing.length === 0 && tooSmall.length === 0 && unplanned.length === 0,
    missing,
    tooSmall,
    unplanned,
    suggestions,
  };
}

/** One sentence per problem, naming every level concerned and what to do. */
export function planMismatchMessage(m: PlanMatch): string {
  const q = (xs: string[]) => xs.map((x) => `"${x}"`).join(", ");
  const parts: string[] = [];
  if (m.missing.length)
    parts.push(`No data for the planned level${m.missing.length > 1 ? "s" : ""} ${q(m.missing)}.`);
  for (const t of m.tooSmall)
    parts.push(
      `The planned level "${t.level}" has ${t.n} value${t.n === 1 ? "" : "s"}; every group needs at least two.`,
    );
  const unmatched = m.unplanned.filter((u) => !m.suggestions.some((s) => s.found === u));
  if (unmatched.length)
    parts.push(
      `The file has group${unmatched.length > 1 ? "s" : ""} the plan does not name: ${q(unmatched)}; map ${unmatched.length > 1 ? "them" : "it"} to a planned level or to null (leave out) with levelMap.`,
    );
  for (const s of m.suggestions)
    parts.push(
      `"${s.found}" looks like the planned level "${s.planned}"; confirm it with levelMap to use it.`,
    );
  return `The data do not match the plan. ${parts.join(" ")}`;
}

/** Throws 422 with the list of what is missing (and the mapping offers) when the data do not match. */
export function requirePlanMatch(
  report: ValidationReport,
  planned: readonly string[],
  map: LevelMap = {},
): void {
  const m = matchPlan(
    report,
    planned,
    Object.keys(map).filter((k) => map[k] === null),
  );
  if (m.matches) return;
  throw new HttpError(422, "data_does_not_match_plan", planMismatchMessage(m), {
    report: { ...report, levelSuggestions: m.suggestions },
    missing: m.missing,
    tooSmall: m.tooSmall,
    unplanned: m.unplanned,
    suggestions: m.suggestions,
  });
}
