import { describe, expect, it } from "vitest";
import { analyze } from "./analyze.js";
import { StatsInputError } from "./errors.js";

const orchard = [
  { name: "Row A", values: [4.1, 4.5, 3.9, 4.8, 4.2, 4.4] },
  { name: "Row B", values: [5.0, 5.6, 4.9, 5.3, 5.8, 5.1] },
  { name: "Row C", values: ["4.6", "4.3", "5.2", "4.9", null, "4.4", "4.7"] },
];

/** Every number finite, nothing undefined: the output contract. */
function assertClean(x: unknown, path = "result"): void {
  if (typeof x === "number") expect(Number.isFinite(x), `${path} = ${x}`).toBe(true);
  else if (x === undefined) throw new Error(`${path} is undefined`);
  else if (Array.isArray(x)) x.forEach((v, i) => assertClean(v, `${path}[${i}]`));
  else if (x && typeof x === "object") for (const [k, v] of Object.entries(x)) assertClean(v, `${path}.${k}`);
}

describe("analyze", () => {
  it("returns every contract key", () => {
    const r = analyze({ groups: orchard });
    for (const key of [
      "engineVersion",
      "groups",
      "anova",
      "welch",
      "kruskalWallis",
      "levene",
      "brownForsythe",
      "bartlett",
      "shapiroWilk",
      "shapiroWilkResiduals",
      "sdRatio",
      "outliers",
      "qq",
      "posthoc",
      "familyWiseError",
      "recommendation",
      "sensitivity",
      "checkWarnings",
      "warnings",
    ]) {
      expect(r, key).toHaveProperty(key);
    }
    for (const key of [
      "name",
      "n",
      "missing",
      "mean",
      "sd",
      "se",
      "ciLower",
      "ciUpper",
      "median",
      "q1",
      "q3",
      "iqr",
      "min",
      "max",
      "skewness",
      "kurtosis",
    ]) {
      expect(r.groups[0], key).toHaveProperty(key);
    }
    for (const key of [
      "F",
      "df1",
      "df2",
      "p",
      "ssBetween",
      "ssWithin",
      "ssTotal",
      "msBetween",
      "msWithin",
      "etaSquared",
      "omegaSquared",
      "cohensF",
    ]) {
      expect(r.anova, key).toHaveProperty(key);
    }
    expect(r.shapiroWilk.map((s) => (s as { group: string }).group)).toEqual(["Row A", "Row B", "Row C"]);
    expect(r.recommendation.reasons.length).toBeGreaterThan(0);
    assertClean(r);
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });

  it("counts missing values per group and warns", () => {
    const r = analyze({ groups: orchard });
    expect(r.groups.map((g) => g.missing)).toEqual([0, 0, 1]);
    expect(r.warnings[0]).toContain("1 missing value was excluded");
  });

  it("is deterministic (seeded permutation p)", () => {
    expect(JSON.stringify(analyze({ groups: orchard }))).toBe(JSON.stringify(analyze({ groups: orchard })));
  });

  it("throws StatsInputError for unusable input", () => {
    expect(() => analyze({ groups: [orchard[0]!] })).toThrow(
      new StatsInputError("The analysis needs at least two groups; found 1"),
    );
    expect(() => analyze({ groups: [orchard[0]!, { name: "X", values: [1, null] }] })).toThrow(
      new StatsInputError("The analysis needs at least two values in every group; group 'X' has 1"),
    );
    expect(() => analyze({ groups: [orchard[0]!, { name: "X", values: ["1", "2", "abc"] }] })).toThrow(
      /'abc' in group 'X'/,
    );
    expect(() => analyze({ groups: [orchard[0]!, { name: "X", values: [1, 2, Infinity] }] })).toThrow(
      /must be finite/,
    );
    expect(() => analyze({ groups: orchard, options: { adjust: "sidak" as never } })).toThrow(
      /adjust option must be one of holm, bonferroni, bh/,
    );
    expect(() => analyze({ groups: orchard, options: { control: "Row Z" } })).toThrow(
      /control group 'Row Z'/,
    );
  });

  it("explains, part by part, when all values are identical", () => {
    const r = analyze({
      groups: [
        { name: "A", values: [3, 3, 3] },
        { name: "B", values: [3, 3] },
      ],
    });
    expect(r.anova).toMatchObject({ available: false });
    expect(r.welch).toMatchObject({ available: false });
    expect(r.kruskalWallis).toMatchObject({ available: false });
    expect(r.bartlett).toMatchObject({ available: false });
    expect(r.sdRatio).toMatchObject({ available: false });
    expect(r.warnings.join(" ")).toContain("All values are identical");
    assertClean(r);
  });

  it("runs everything else when one group has zero variance", () => {
    const r = analyze({
      groups: [
        { name: "A", values: [1, 2, 3, 4] },
        { name: "B", values: [5, 5, 5] },
        { name: "C", values: [2, 3, 4] },
      ],
    });
    expect(r.welch).toMatchObject({ available: false, reason: expect.stringContaining("'B'") });
    expect(r.bartlett).toMatchObject({ available: false });
    expect(r.anova).toMatchObject({ available: true });
    expect(r.kruskalWallis).toMatchObject({ available: true });
    expect(r.warnings.join(" ")).toContain("Zero variance in group 'B'");
    assertClean(r);
  });

  it("works for two groups, with the two-sample caveat", () => {
    const r = analyze({ groups: orchard.slice(0, 2) });
    expect(r.recommendation.caveats.map((c) => c.text).join(" ")).toContain("two-sample");
  });

  it("runs the post-hoc families, with comparisons against a named control", () => {
    const r = analyze({ groups: orchard, options: { control: "Row A" } });
    const ph = r.posthoc;
    expect(ph.tukey).toHaveLength(3);
    expect(ph.gamesHowell).toHaveLength(3);
    expect(ph.dunn).toHaveLength(3);
    const control = ph.control!;
    expect(control.dunnett).toHaveLength(2);
    expect(control.welchHolm).toHaveLength(2);
    expect(control.dunn).toHaveLength(2);
    // No planned sizes given: the cautious reading (unequal) puts a means question on Welch's ANOVA.
    expect(r.recommendation.posthoc).toBe("welch-vs-control-holm");
    expect(r.familyWiseError).toMatchObject({ m: 2, comparisons: "vs-control" }); // k − 1 comparisons with the control, as planned
    assertClean(r);
  });

  it("gives paired designs an out-of-scope recommendation", () => {
    expect(analyze({ groups: orchard, options: { independent: "paired" } }).recommendation.test).toBe(
      "out-of-scope",
    );
  });
});
