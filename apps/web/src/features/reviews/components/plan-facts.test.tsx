import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { makeAnalysis, makeDataset, makeStudy } from "@/test/make-study";
import { DataFacts } from "./plan-facts";

const v1 = makeDataset({ id: 11, version: 1, fileName: "joints.csv" });
const v2 = makeDataset({ id: 12, version: 2, fileName: "joints-v2.csv" });

describe("DataFacts", () => {
  it("names the active version the analysis used, and a later upload set aside", () => {
    render(
      <DataFacts
        study={makeStudy({ latestDataset: v2, activeDataset: v1 })}
        analysis={makeAnalysis({ datasetId: 11, datasetVersion: 1 })}
      />,
    );
    const text = screen.getByLabelText("Data").textContent ?? "";
    expect(text).toContain("joints.csv · version 1, the active version");
    expect(text).toContain("Version 2 was uploaded later; the analyst made version 1 the active one again.");
    expect(text).not.toContain("another version than the active one");
  });

  it("marks an analysis shown on another version than the active one", () => {
    render(
      <DataFacts
        study={makeStudy({ latestDataset: v2, activeDataset: v2 })}
        analysis={makeAnalysis({ datasetId: 11, datasetVersion: 1 })}
      />,
    );
    const text = screen.getByLabelText("Data").textContent ?? "";
    expect(text).toContain("joints-v2.csv · version 2, the active version");
    expect(text).toContain("Version 1");
    expect(text).toContain("The analysis shown used another version than the active one.");
    expect(text).not.toContain("uploaded later");
  });
});
