import { describe, expect, it } from "vitest";
import { sensitivityAnalyses } from "./sensitivity.js";

describe("sensitivityAnalyses", () => {
  it("writes a sentence for each test that reaches the other conclusion at α", () => {
    const s = sensitivityAnalyses("welch", 0.05, {
      anova: { available: true, p: 0.03 },
      welch: { available: true, p: 0.012 },
      "kruskal-wallis": { available: true, p: 0.081 },
    });
    expect(s.entries.map((e) => e.test)).toEqual(["anova", "kruskal-wallis"]);
    expect(s.notes).toHaveLength(1);
    expect(s.notes[0]!.code).toBe("sensitivity.disagrees");
    expect(s.notes[0]!.text).toMatch(
      /^The Kruskal–Wallis test does not find a difference at α = \.05 \(p = \.081\), unlike the primary Welch's ANOVA \(p = \.012\)/,
    );
  });

  it("says so when every alternative agrees, and carries unavailable tests with their reason", () => {
    const s = sensitivityAnalyses("anova", 0.05, {
      anova: { available: true, p: 0.2 },
      welch: { available: false, reason: "group 'A' has zero variance" },
      "kruskal-wallis": { available: true, p: 0.3 },
    });
    expect(s.notes.map((n) => n.code)).toEqual(["sensitivity.all-agree"]);
    expect(s.entries[0]).toEqual({ test: "welch", available: false, reason: "group 'A' has zero variance" });
  });
});
