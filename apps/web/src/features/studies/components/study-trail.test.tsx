import { render, screen } from "@testing-library/react";
import { MemoryRouter } from "react-router-dom";
import { describe, expect, it } from "vitest";
import { makeDataset, makeProgress, makeStudy } from "@/test/make-study";
import { studySteps } from "../step-status";
import { StudyTrail } from "./study-trail";

describe("StudyTrail", () => {
  it("marks only the step the server names as next", () => {
    const study = makeStudy({
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: "2025-12-03T14:05:00.000Z" },
      latestDataset: makeDataset(),
      activeDataset: makeDataset(),
      progress: makeProgress({
        state: "awaiting-analysis",
        label: "Data not yet analysed",
        nextStep: { who: "analyst", where: "choice", action: "Run the analysis on data version 1" },
      }),
    });
    render(
      <MemoryRouter>
        <StudyTrail studyId={7} steps={studySteps(study)} />
      </MemoryRouter>,
    );
    expect(screen.getAllByText("next")).toHaveLength(1);
    expect(screen.getByTestId("trail-choice").getAttribute("data-next")).toBe("true");
    expect(screen.getByTestId("trail-data").getAttribute("data-next")).toBeNull();
  });
});
