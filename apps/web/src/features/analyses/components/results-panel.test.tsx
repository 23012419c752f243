import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderWithProviders } from "@/test/render";
import { engineResult } from "@/test/engine-fixtures";
import { makeAnalysis, makeStudy, unavailableResult } from "@/test/make-study";
import { formatBounded, formatDf, formatP, formatStat } from "@/lib/format";
import { CAUTION_TEXT } from "./caution-note";
import { ResultsPanel } from "./results-panel";

// A leaked JavaScript value; the engine's prose may say a statistic "is undefined" in words.
const BAD = /NaN|(?<!is )undefined|Infinity|\bnull\b|\[object/;

// Every result here is analyze() on seeded invented data (src/test/engine-fixtures.ts); the
// expected strings follow the reporting format (APA 7th ed., common practice) over its numbers.
const equal = engineResult("equal-spread");
const unequal = engineResult("unequal-spread");

describe("ResultsPanel", () => {
  it("renders no NaN, undefined or null when every part is unavailable, and gives the engine's reasons", () => {
    const none = unavailableResult();
    const { container } = renderWithProviders(
      <ResultsPanel study={makeStudy()} analysis={makeAnalysis({ result: none, summary: [] })} />,
    );
    expect(container.textContent).not.toMatch(BAD);
    if (none.anova.available) throw new Error("the identical-values scenario must leave ANOVA unavailable");
    expect(container.textContent).toContain(none.anova.reason);
    expect(screen.getByText(/could not be computed on these data/)).toBeTruthy();
  });

  it("shows the omnibus line in reporting form with the effect size", () => {
    if (!equal.anova.available) throw new Error("the equal-spread scenario must give a classic ANOVA");
    const a = equal.anova;
    const { container } = renderWithProviders(
      <ResultsPanel study={makeStudy()} analysis={makeAnalysis({ result: equal, summary: [] })} />,
    );
    expect(screen.getByTestId("omnibus-line").textContent).toBe(
      `F(${formatDf(a.df1)}, ${formatDf(a.df2)}) = ${formatStat(a.F)}, p ${formatP(a.p)}, ω² = ${formatBounded(a.omegaSquared)}`,
    );
    expect(a.df2).toBe(27); // N − k = 30 − 3
    expect(container.textContent).not.toMatch(BAD);
    expect(screen.getByText("Statistical and practical significance")).toBeTruthy();
  });

  it("Welch's df2 has one decimal; its effect size is labelled when borrowed from the classic ANOVA", () => {
    renderWithProviders(
      <ResultsPanel
        study={makeStudy()}
        analysis={makeAnalysis({ chosenTest: "welch", posthocMethod: "games-howell", result: unequal })}
      />,
    );
    expect(screen.getByTestId("omnibus-line").textContent).toMatch(
      /^F\(2, \d+\.\d\) = \d+\.\d{2}, p [=<] \.\d{3}, ω² = -?\.\d{2}$/,
    );
    expect(screen.getByText(/from the classic ANOVA's sums of squares/)).toBeTruthy();
  });

  it("drops summary lines that carry a missing number and uses its own sentence", () => {
    const { container } = renderWithProviders(
      <ResultsPanel
        study={makeStudy()}
        analysis={makeAnalysis({ result: equal, summary: ["F(2, 27) = NaN, p = undefined"] })}
      />,
    );
    expect(container.textContent).not.toMatch(BAD);
  });

  it("lists every Tukey–Kramer pair with its interval and Hedges' g, and a dash for a withheld number", () => {
    const result = engineResult("equal-spread");
    const pairs = result.posthoc.tukey;
    if (!Array.isArray(pairs)) throw new Error("the equal-spread scenario must give Tukey–Kramer pairs");
    // analyze() withholds a non-finite number as Unavailable; the table must show a dash for it.
    (pairs[1] as unknown as { lower: unknown }).lower = { available: false, reason: "withheld" };
    const { container } = renderWithProviders(
      <ResultsPanel study={makeStudy()} analysis={makeAnalysis({ result })} />,
    );
    const table = screen.getByRole("table", { name: "Post-hoc comparisons" });
    const rows = table.querySelectorAll("tbody tr");
    expect(rows).toHaveLength(3); // k(k − 1)/2 pairs for k = 3
    const [first, second] = pairs;
    if (!first?.hedgesG.available) throw new Error("Hedges' g must be available here");
    expect(rows[0]?.textContent).toBe(
      `${first.a} − ${first.b}${formatStat(first.diff)}[${formatStat(first.lower)}, ${formatStat(first.upper)}]${formatP(first.pAdj).replace(/^= /, "")}${formatStat(first.hedgesG.g)}`,
    );
    expect(rows[1]?.textContent).toContain(`${second?.a} − ${second?.b}${formatStat(second!.diff)}—.`);
    expect(container.textContent).not.toMatch(BAD);
  });

  it.each(["clinical", "safety-critical"] as const)("shows the caution for a %s study", (context) => {
    renderWithProviders(
      <ResultsPanel study={makeStudy({ context })} analysis={makeAnalysis({ result: equal })} />,
    );
    expect(screen.getByTestId("caution-note").textContent).toBe(CAUTION_TEXT);
  });

  it("shows no caution for a general study", () => {
    renderWithProviders(<ResultsPanel study={makeStudy()} analysis={makeAnalysis({ result: equal })} />);
    expect(screen.queryByTestId("caution-note")).toBeNull();
  });

  it("marks a deviation from the plan for the reviewer", () => {
    renderWithProviders(
      <ResultsPanel
        study={makeStudy()}
        analysis={makeAnalysis({
          chosenTest: "kruskal-wallis",
          posthocMethod: "dunn",
          plannedTest: "anova",
          deviation: { justification: "Ratings on a coarse 1–7 scale." },
          result: equal,
        })}
      />,
    );
    expect(screen.getByText("Shown to the reviewer.")).toBeTruthy();
    expect(
      screen.getByText(
        /the Kruskal–Wallis test was run instead of the plan's primary test, classic one-way ANOVA/i,
      ),
    ).toBeTruthy();
  });
});
