import { render, screen, within } from "@testing-library/react";
import { MemoryRouter } from "react-router-dom";
import { describe, expect, it } from "vitest";
import { makeProgress, makeStudy } from "@/test/make-study";
import { ProgressBanner } from "./progress-banner";
import { StudyList } from "./study-list";

// The server's statuses (apps/api/src/modules/studies/study-status.ts) for two studies.
const sentBack = makeStudy({
  id: 1,
  title: "Seedling height",
  updatedAt: "2025-12-01T09:00:00.000Z",
  progress: makeProgress({
    state: "changes-requested",
    label: "Changes requested",
    detail: "The reviewer sent round 1 back with 2 comments. Analysis 3 is on the active data version.",
    nextStep: { who: "analyst", where: "results", action: "Reply to the comments and submit again" },
  }),
  openReview: {
    round: 1,
    decidedAt: "2025-12-02T09:00:00Z",
    decidedBy: { id: 2, displayName: "Rui Takahashi" },
    comments: [
      {
        id: 1,
        step: "data",
        body: "Say whether the two tall plants stay in.",
        author: { id: 2, displayName: "Rui Takahashi" },
        createdAt: "2025-12-02T09:00:00Z",
        replies: [],
      },
    ],
  },
});
const newer = makeStudy({ id: 2, title: "Primer drying", updatedAt: "2025-12-05T09:00:00.000Z" });

describe("StudyList", () => {
  it("puts the study sent back first and shows the server's label, sentence and next step", () => {
    render(
      <MemoryRouter>
        <StudyList studies={[newer, sentBack]} />
      </MemoryRouter>,
    );
    const items = within(screen.getByRole("list", { name: "Studies" })).getAllByRole("listitem");
    expect(items.map((li) => within(li).getAllByRole("link")[0]!.textContent)).toEqual([
      "Seedling height",
      "Primer drying",
    ]);
    expect(within(items[0]!).getByTestId("progress-badge").textContent).toBe("Changes requested");
    expect(items[0]!.textContent).toContain("The reviewer sent round 1 back with 2 comments.");
    expect(items[0]!.textContent).toContain("Next: Reply to the comments and submit again.");
    expect(within(items[1]!).getByTestId("progress-badge").textContent).toBe("Design questions open");
  });
});

describe("ProgressBanner", () => {
  it("after changes were requested, says so and names the steps the comments stand at", () => {
    render(<ProgressBanner study={sentBack} />);
    const banner = screen.getByRole("alert");
    expect(banner.textContent).toContain("Changes requested");
    expect(banner.textContent).toContain("The comments stand at the step they concern: Data.");
    expect(banner.textContent).toContain("Next, for the analyst: Reply to the comments and submit again.");
  });

  it("otherwise is a quiet status line with the server's sentence", () => {
    render(<ProgressBanner study={newer} />);
    expect(screen.getByRole("status").textContent).toContain("Some design questions are not answered yet.");
  });
});
