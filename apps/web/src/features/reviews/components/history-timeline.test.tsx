import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderWithProviders } from "@/test/render";
import type { StudyHistory } from "@waymark/contract";
import { HistoryTimelineView } from "./history-timeline";

const HASH = "9f2c4e1a7b3d5f60718293a4b5c6d7e8f90112233445566778899aabbccddeef";
const person = (id: number, displayName: string) => ({ id, displayName });

const HISTORY: StudyHistory = {
  rounds: [
    {
      id: 1,
      round: 1,
      analysisId: 1,
      datasetId: 1,
      submittedAt: "2025-12-01T09:00:00Z",
      submittedBy: person(1, "Ada Okafor"),
      decision: "changes_requested",
      decidedAt: "2025-12-02T09:00:00Z",
      decidedBy: person(2, "Rui Takahashi"),
      comments: [
        {
          id: 1,
          step: null,
          body: "Explain the override.",
          author: person(2, "Rui Takahashi"),
          createdAt: "2025-12-02T09:00:00Z",
          replies: [
            {
              id: 1,
              body: "The ratings are ordinal; the plan now says so.",
              author: person(1, "Ada Okafor"),
              createdAt: "2025-12-02T10:00:00Z",
            },
          ],
        },
        {
          id: 2,
          step: "checks",
          body: "<b>Two</b> outliers are not discussed.",
          author: person(2, "Rui Takahashi"),
          createdAt: "2025-12-02T09:00:00Z",
          replies: [],
        },
      ],
      changes: null,
      signature: null,
    },
    {
      id: 2,
      round: 2,
      analysisId: 2,
      datasetId: 1,
      submittedAt: "2025-12-03T09:00:00Z",
      submittedBy: person(1, "Ada Okafor"),
      decision: "approved",
      decidedAt: "2025-12-04T09:00:00Z",
      decidedBy: person(2, "Rui Takahashi"),
      comments: [],
      changes: {
        sinceRound: 1,
        dataVersion: { before: 1, after: 2, changed: true },
        test: { before: "anova", after: "anova", changed: false },
        posthoc: { before: "tukey-kramer", after: "tukey-kramer", changed: false },
        deviation: { before: null, after: null, changed: false },
        keyNumbers: [],
        summary: ["Data version 1 → 2."],
      },
      signature: {
        signerName: "Rui Takahashi",
        signedAt: "2025-12-04T09:00:00Z",
        meaning: "Approved as the analysis of record",
        contentHash: HASH,
      },
    },
  ],
  approvalValid: false,
  approvalNote: "What was approved has changed since it was signed, so the approval no longer holds.",
  events: [
    {
      id: 1,
      at: "2025-12-01T09:00:00Z",
      actorEmail: "analyst@waymark.test",
      action: "study.submitted",
      summary: "Submitted for review (round 1, analysis 3)",
    },
  ],
};

describe("HistoryTimelineView", () => {
  it("shows rounds, decisions, step comments as text, and the signature with a shortened hash", () => {
    renderWithProviders(<HistoryTimelineView history={HISTORY} />);
    expect(
      within(screen.getByRole("list", { name: "Review rounds" }))
        .getAllByRole("heading")
        .map((h) => h.textContent),
    ).toEqual(["Round 1", "Round 2"]);
    expect(screen.getByText(/Changes requested by Rui Takahashi/)).toBeTruthy();
    expect(screen.getByText("On the Checks step", { exact: false })).toBeTruthy();
    expect(screen.getByText("<b>Two</b> outliers are not discussed.")).toBeTruthy();
    const sig = screen.getByTestId("signature-record");
    expect(within(sig).getByTestId("short-hash").textContent).toBe(`${HASH.slice(0, 12)}…`);
    expect(within(sig).getByTestId("short-hash").getAttribute("title")).toBe(HASH);
    expect(screen.getByText(/The approval no longer holds/)).toBeTruthy();
    expect(screen.getByText(/Submitted for review \(round 1, analysis 3\)/)).toBeTruthy();
  });

  it("lists the analyst's reply under its comment and says what changed in round 2", () => {
    renderWithProviders(<HistoryTimelineView history={HISTORY} />);
    const replies = screen.getByRole("list", { name: "Replies" });
    expect(within(replies).getByText("The ratings are ordinal; the plan now says so.")).toBeTruthy();
    expect(within(replies).getByText(/Ada Okafor replied/)).toBeTruthy();
    expect(screen.getByText("Since round 1: Data version 1 → 2.")).toBeTruthy();
  });
});
