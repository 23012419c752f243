import { fireEvent, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderWithProviders } from "@/test/render";
import type { QueueItem } from "@waymark/contract";
import { ReviewQueueTable } from "./review-queue-table";

const item = (studyId: number, title: string, daysWaiting: number, override = false): QueueItem => ({
  studyId,
  title,
  analyst: { id: 1, displayName: studyId === 2 ? "Bo Lund" : "Ada Okafor" },
  submittedAt: new Date(Date.UTC(2025, 11, 10 - daysWaiting)).toISOString(),
  round: 1,
  recommendedTest: "welch",
  chosenTest: override ? "anova" : "welch",
  override,
  daysWaiting,
});

const QUEUE = [
  item(1, "Fertiliser trial", 2),
  item(2, "Cooling rates", 9, true),
  item(3, "Reading scores", 0),
];

function titles(): string[] {
  const rows = within(screen.getByTestId("review-queue")).getAllByRole("row").slice(1);
  return rows.map((r) => within(r).getAllByRole("cell")[0]!.textContent ?? "");
}

describe("ReviewQueueTable", () => {
  it("starts with the longest-waiting study and sorts by days waiting both ways", () => {
    renderWithProviders(<ReviewQueueTable queue={QUEUE} />);
    expect(titles()).toEqual(["Cooling rates", "Fertiliser trial", "Reading scores"]);
    const header = screen.getByRole("columnheader", { name: /Waiting/ });
    expect(header.getAttribute("aria-sort")).toBe("descending");
    fireEvent.click(within(header).getByRole("button"));
    expect(header.getAttribute("aria-sort")).toBe("ascending");
    expect(titles()).toEqual(["Reading scores", "Fertiliser trial", "Cooling rates"]);
  });

  it("marks a deviation from the plan with words and filters by text and by deviation", () => {
    renderWithProviders(<ReviewQueueTable queue={QUEUE} />);
    const rows = within(screen.getByTestId("review-queue")).getAllByRole("row");
    expect(within(rows[1]!).getByText("Deviation")).toBeTruthy();
    expect(screen.getAllByText("None")).toHaveLength(2);
    fireEvent.change(screen.getByLabelText("Find a study or analyst"), { target: { value: "bo lund" } });
    expect(titles()).toEqual(["Cooling rates"]);
    fireEvent.change(screen.getByLabelText("Find a study or analyst"), { target: { value: "" } });
    fireEvent.click(screen.getByLabelText(/Only studies with a deviation from the plan/));
    expect(titles()).toEqual(["Cooling rates"]);
  });

  it("says so when nothing waits", () => {
    renderWithProviders(<ReviewQueueTable queue={[]} />);
    expect(screen.getByText("No study is waiting for review.")).toBeTruthy();
  });
});
