import { describe, expect, it } from "vitest";
import { analyze } from "../analyze.js";
import { COMPARISONS, OMNIBUS_TESTS, POSTHOC_FAMILIES } from "./ids.js";
import {
  ADJUSTMENT_TERMS,
  CHECK_TERMS,
  POSTHOC_TERMS,
  posthocSentence,
  TEST_TERMS,
  testName,
} from "./names.js";
import { posthocFamilyFor } from "./posthoc-family.js";

describe("vocabulary", () => {
  it("matches each test with its post-hoc family (pooled variance, separate variances, ranks)", () => {
    // The pairing is common practice: Tukey–Kramer/Dunnett share classic ANOVA's pooled error
    // variance, Games–Howell/Welch t drop equal variances as Welch's ANOVA does, Dunn ranks as
    // Kruskal–Wallis does (Dunn 1964, Technometrics 6, 241–252).
    expect(OMNIBUS_TESTS.flatMap((t) => COMPARISONS.map((c) => posthocFamilyFor(t, c)))).toEqual([
      "tukey-kramer",
      "dunnett",
      "games-howell",
      "welch-vs-control-holm",
      "dunn",
      "dunn-vs-control",
    ]);
    // Every family is reached by exactly one (test, comparisons) pair.
    expect(new Set(OMNIBUS_TESTS.flatMap((t) => COMPARISONS.map((c) => posthocFamilyFor(t, c))))).toEqual(
      new Set(POSTHOC_FAMILIES),
    );
  });

  it("gives every id a name, and names stay capitalised as written", () => {
    for (const terms of [TEST_TERMS, POSTHOC_TERMS, ADJUSTMENT_TERMS, CHECK_TERMS])
      for (const t of Object.values(terms)) for (const w of Object.values(t)) expect(w.trim()).not.toBe("");
    expect(testName("welch")).toBe("Welch's ANOVA");
    expect(Object.values(TEST_TERMS).map((t) => t.title)).not.toContain("welch's ANOVA");
    expect(testName("unknown-id")).toBe("unknown-id");
  });

  it("names the plan's adjustment only where the family uses it", () => {
    expect(posthocSentence("dunn", "bh")).toContain("Benjamini–Hochberg");
    expect(posthocSentence("tukey-kramer", "bh")).not.toContain("{adjustment}");
    expect(posthocSentence("tukey-kramer", "bh")).not.toContain("Benjamini");
  });

  it("the recommendation's post-hoc family is the one posthocFamilyFor gives", () => {
    const groups = [
      { name: "A", values: [4.1, 5.2, 4.8, 5.0, 4.6, 5.3] },
      { name: "B", values: [5.9, 6.1, 6.4, 5.7, 6.0, 6.3] },
      { name: "C", values: [4.9, 5.1, 5.4, 5.0, 4.7, 5.2] },
    ];
    for (const comparisons of COMPARISONS) {
      const r = analyze({ groups, options: comparisons === "vs-control" ? { control: "A" } : {} });
      const test = r.recommendation.test;
      if (test === "out-of-scope") throw new Error("unexpected");
      expect(r.recommendation.posthoc).toBe(posthocFamilyFor(test, comparisons));
    }
  });
});
