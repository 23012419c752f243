import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderWithProviders } from "@/test/render";
import { makeAnalysis, makeStudy, unavailableResult } from "@/test/make-study";
import type { AnalysisResult } from "@/features/studies/types";
import { CAUTION_TEXT } from "./caution-note";
import { ResultsPanel } from "./results-panel";

const BAD = /NaN|undefined|Infinity|\bnull\b|\[object/;

// Numbers of an invented three-group example; the expected strings follow the reporting
// format (APA 7th ed., common practice), not a computation.
const partial: AnalysisResult = {
  ...unavailableResult(),
  groups: [
    { name: "Epoxy", n: 10, mean: 21.4, sd: 2.1, median: 21.2, min: 18, max: 25 },
    {
      name: "Acrylic",
      n: 10,
      mean: 19.8,
      sd: { available: false, reason: "not computed" },
      median: 19.5,
      min: 16,
      max: 23,
    },
    { name: "Urethane", n: 10, mean: 23.9, sd: 2.4, median: 23.7, min: 20, max: 28 },
  ],
  anova: {
    F: 4.2101,
    df1: 2,
    df2: 27,
    p: 0.0254,
    omegaSquared: 0.1712,
    etaSquared: 0.2377,
    cohensF: 0.558,
    msWithin: 5.1,
  },
  welch: { F: 5.104, df1: 2, df2: 15.348, p: 0.0199 },
  options: { alpha: 0.05, comparisons: "all-pairs" },
};

describe("ResultsPanel", () => {
  it("renders no NaN, undefined or null when every part is unavailable, and gives the reasons", () => {
    const { container } = renderWithProviders(
      <ResultsPanel
        study={makeStudy()}
        analysis={makeAnalysis({ result: unavailableResult(), summary: [] })}
      />,
    );
    expect(container.textContent).not.toMatch(BAD);
    expect(screen.getByText(/All values are identical, so the F ratio cannot be formed\./)).toBeTruthy();
    expect(screen.getByText(/post-hoc comparisons are not integrated yet/)).toBeTruthy();
    expect(screen.getByText(/could not be computed on these data/)).toBeTruthy();
  });

  it("shows the omnibus line in reporting form with the effect size", () => {
    const { container } = renderWithProviders(
      <ResultsPanel study={makeStudy()} analysis={makeAnalysis({ result: partial, summary: [] })} />,
    );
    expect(screen.getByTestId("omnibus-line").textContent).toBe("F(2, 27) = 4.21, p = .025, ω² = .17");
    expect(container.textContent).not.toMatch(BAD);
    expect(screen.getByTestId("plain-summary").textContent).toMatch(/statistically significant difference/);
    expect(screen.getByText("Statistical and practical significance")).toBeTruthy();
  });

  it("Welch's df2 has one decimal; its effect size is labelled when borrowed from the classic ANOVA", () => {
    renderWithProviders(
      <ResultsPanel
        study={makeStudy()}
        analysis={makeAnalysis({ chosenTest: "welch", posthocMethod: "Games–Howell", result: partial })}
      />,
    );
    expect(screen.getByTestId("omnibus-line").textContent).toBe("F(2, 15.3) = 5.10, p = .020, ω² = .17");
    expect(screen.getByText(/from the classic ANOVA's sums of squares/)).toBeTruthy();
  });

  it("drops summary lines that carry a missing number and uses its own sentence", () => {
    const { container } = renderWithProviders(
      <ResultsPanel
        study={makeStudy()}
        analysis={makeAnalysis({ result: partial, summary: ["F(2, 27) = NaN, p = undefined"] })}
      />,
    );
    expect(container.textContent).not.toMatch(BAD);
  });

  // d = difference ÷ √MS_within: 1.6 ÷ √5.1 = 0.71 and 4.1 ÷ √5.1 = 1.82 (by hand).
  it("post-hoc rows with missing intervals show a dash, never a broken number", () => {
    const result: AnalysisResult = {
      ...partial,
      posthoc: {
        tukey: [
          { a: "Epoxy", b: "Acrylic", diff: 1.6, lower: -0.9, upper: 4.1, pAdj: 0.27 },
          {
            a: "Urethane",
            b: "Acrylic",
            diff: 4.1,
            lower: { available: false, reason: "x" },
            upper: 6.6,
            pAdj: 0.0004,
          },
        ],
        gamesHowell: { available: false, reason: "zero variance" },
        dunn: { available: false, reason: "ties" },
      },
    };
    const { container } = renderWithProviders(
      <ResultsPanel study={makeStudy()} analysis={makeAnalysis({ result })} />,
    );
    const table = screen.getByRole("table", { name: "Post-hoc comparisons" });
    expect(table.textContent).toMatch(/Epoxy − Acrylic1\.60\[−0\.90, 4\.10\]\.2700\.71/);
    expect(table.textContent).toMatch(/Urethane − Acrylic4\.10—< \.0011\.82/);
    expect(container.textContent).not.toMatch(BAD);
  });

  it.each(["clinical", "safety-critical"] as const)("shows the caution for a %s study", (context) => {
    renderWithProviders(
      <ResultsPanel study={makeStudy({ context })} analysis={makeAnalysis({ result: partial })} />,
    );
    expect(screen.getByTestId("caution-note").textContent).toBe(CAUTION_TEXT);
  });

  it("shows no caution for a general study", () => {
    renderWithProviders(<ResultsPanel study={makeStudy()} analysis={makeAnalysis({ result: partial })} />);
    expect(screen.queryByTestId("caution-note")).toBeNull();
  });

  it("marks an override for the reviewer", () => {
    renderWithProviders(
      <ResultsPanel
        study={makeStudy()}
        analysis={makeAnalysis({
          chosenTest: "kruskal-wallis",
          override: { justification: "Ratings on a coarse 1–7 scale." },
          result: partial,
        })}
      />,
    );
    expect(screen.getByText("Override, flagged for the reviewer.")).toBeTruthy();
  });
});
