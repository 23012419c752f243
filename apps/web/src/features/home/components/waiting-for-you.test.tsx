import { render, screen } from "@testing-library/react";
import { MemoryRouter } from "react-router-dom";
import { describe, expect, it } from "vitest";
import { makeProgress, makeStudy } from "@/test/make-study";
import { waitingFor, WaitingForYou } from "./waiting-for-you";

const analyst = {
  id: 1,
  email: "a@waymark.test",
  displayName: "Ada Okafor",
  role: "analyst",
  active: true,
} as const;
const reviewer = { ...analyst, id: 2, role: "reviewer" } as const;

const sentBack = makeStudy({
  id: 1,
  title: "Seedling height",
  updatedAt: "2025-12-01T09:00:00.000Z",
  progress: makeProgress({
    state: "changes-requested",
    label: "Changes requested",
    detail: "The reviewer sent round 1 back with 2 comments.",
    nextStep: { who: "analyst", where: "results", action: "Reply to the comments and submit again" },
  }),
});
const draft = makeStudy({ id: 2, title: "Primer drying", updatedAt: "2025-12-05T09:00:00.000Z" });
const inReview = makeStudy({
  id: 3,
  title: "Call handling",
  status: "in_review",
  progress: makeProgress({
    state: "in-review",
    label: "Awaiting review",
    nextStep: { who: "reviewer", where: "review", action: "Review: approve or request changes" },
  }),
});
const someoneElses = makeStudy({ id: 4, owner: { id: 9, displayName: "Other" } });

describe("waitingFor", () => {
  it("puts the analyst's sent-back study first, even when another changed later", () => {
    expect(waitingFor(analyst, [draft, inReview, sentBack, someoneElses]).map((s) => s.id)).toEqual([1, 2]);
  });

  it("gives the reviewer the studies awaiting review", () => {
    expect(waitingFor(reviewer, [draft, inReview, sentBack]).map((s) => s.id)).toEqual([3]);
  });
});

describe("WaitingForYou", () => {
  it("shows the server's label and sentence, and links a review to the review page", () => {
    render(
      <MemoryRouter>
        <WaitingForYou user={reviewer} studies={[inReview]} />
      </MemoryRouter>,
    );
    expect(screen.getByText("Awaiting review")).toBeTruthy();
    expect(screen.getByRole("link", { name: "Call handling" }).getAttribute("href")).toBe("/reviews/3");
  });

  it("says so when nothing waits", () => {
    render(
      <MemoryRouter>
        <WaitingForYou user={analyst} studies={[inReview]} />
      </MemoryRouter>,
    );
    expect(screen.getByText("Nothing waits for you right now.")).toBeTruthy();
  });
});
