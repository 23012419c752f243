import type { GroupValues } from "../../packages/stats/src/types/group-summary.js";
import { makeGroups, SCENARIOS, type GroupSpec } from "./generate.js";

/** A reference dataset: invented, drawn from a named seed with the shared generator. */
export interface Dataset {
  id: string;
  /** Numbers, or decimal text where the exact-decimal path is the point of the check. */
  groups: { name: string; values: (number | string)[] }[];
  /** Large constant leading digits: doubles lose digits, compare with exact arithmetic. */
  hard?: boolean;
}

const plain = (g: GroupValues[]) => g.map((x) => ({ name: x.name, values: x.values }));

/** Data with a big constant offset written as decimal text with `decimals` places. */
function offsetText(seed: number, spec: GroupSpec, offset: number, decimals: number): Dataset["groups"] {
  return makeGroups(seed, spec).map((g) => ({
    name: g.name,
    values: g.values.map((v) => (offset + v).toFixed(decimals)),
  }));
}

/**
 * The datasets of the omnibus, assumption and descriptive reference suites: the shared
 * scenarios (balanced, unequal n, unequal variances, skewed, ties, tiny groups, many groups),
 * two-group and heavy-tie sets, large offsets (1e9 and 1e12 plus small noise, as decimal
 * text), and 24 further seeded random designs.
 */
export function referenceDatasets(): Dataset[] {
  const out: Dataset[] = Object.entries(SCENARIOS).map(([id, s]) => ({
    id,
    groups: plain(makeGroups(s.seed, s.spec)),
  }));
  out.push({
    id: "twoGroups",
    groups: plain(makeGroups(811, { n: [14, 19], mean: [2, 2.8], sd: [1, 1.3] })),
  });
  out.push({
    id: "heavyTies",
    groups: plain(
      makeGroups(812, { n: [25, 30, 28], mean: [2, 2.2, 2.1], sd: [0.45, 0.45, 0.45], shape: "ties" }),
    ),
  });
  out.push({
    id: "largerGroups",
    groups: plain(
      makeGroups(813, { n: [120, 95, 140, 110], mean: [0, 0.1, 0.25, 0.05], sd: [1, 1.2, 0.9, 1.6] }),
    ),
  });
  out.push({
    id: "offset1e9",
    hard: true,
    groups: offsetText(814, { n: [10, 12, 9], mean: [0, 0.2, 0.1], sd: [0.3, 0.3, 0.3] }, 1e9, 4),
  });
  out.push({
    id: "offset1e12",
    hard: true,
    groups: offsetText(
      815,
      { n: [21, 21, 21, 21], mean: [0, 0.1, 0, 0.2], sd: [0.2, 0.2, 0.2, 0.2] },
      1e12,
      1,
    ),
  });
  out.push({
    id: "offset1e7fine",
    hard: true,
    groups: offsetText(816, { n: [30, 25, 28], mean: [0, 1e-5, 3e-5], sd: [2e-5, 2e-5, 3e-5] }, 1e7, 7),
  });
  for (let i = 0; i < 24; i++) {
    const seed = 9000 + i;
    const k = 3 + (i % 5);
    const n = Array.from({ length: k }, (_, j) => 4 + ((seed * (j + 3)) % 37));
    const mean = Array.from({ length: k }, (_, j) => 10 + ((j * seed) % 7) * 0.3);
    const sd = Array.from({ length: k }, (_, j) => 0.5 + ((j + i) % 4) * (i % 3 === 0 ? 1.5 : 0.2));
    const shape = (["normal", "skewed", "ties"] as const)[i % 3];
    out.push({ id: `random${seed}`, groups: plain(makeGroups(seed, { n, mean, sd, shape })) });
  }
  return out;
}

/** Relative error with an absolute floor for reference values at zero. */
export function relErr(x: number, ref: number): number {
  if (ref === 0) return Math.abs(x);
  return Math.abs(x - ref) / Math.abs(ref);
}

/** p-values: within 1e-8 absolute or 1e-6 relative (the suites' tolerance). */
export function pClose(x: number, ref: number, abs = 1e-8, rel = 1e-6): boolean {
  return Math.abs(x - ref) <= abs || relErr(x, ref) <= rel;
}
