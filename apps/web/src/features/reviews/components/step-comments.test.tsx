import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import type { OpenReview } from "@waymark/contract";
import { StepComments } from "./step-comments";

const person = (id: number, displayName: string) => ({ id, displayName });
const REVIEW: OpenReview = {
  round: 1,
  decidedAt: "2025-12-02T09:00:00Z",
  decidedBy: person(2, "Rui Takahashi"),
  comments: [
    {
      id: 31,
      step: "checks",
      body: "Two outliers are not discussed.",
      author: person(2, "Rui Takahashi"),
      createdAt: "2025-12-02T09:00:00Z",
      replies: [
        {
          id: 1,
          body: "Both are recording errors.",
          author: person(1, "Ada Okafor"),
          createdAt: "2025-12-02T10:00:00Z",
        },
      ],
    },
    {
      id: 32,
      step: null,
      body: "Say what the effect size means.",
      author: person(2, "Rui Takahashi"),
      createdAt: "2025-12-02T09:00:00Z",
      replies: [],
    },
  ],
};

afterEach(() => vi.unstubAllGlobals());

describe("StepComments", () => {
  it("shows only the comments on its step, with their replies", () => {
    renderWithProviders(<StepComments studyId={7} review={REVIEW} step="checks" canReply={false} />);
    const box = screen.getByTestId("step-comments");
    expect(within(box).getByText("Two outliers are not discussed.")).toBeTruthy();
    expect(within(box).queryByText("Say what the effect size means.")).toBeNull();
    expect(within(box).getByText("Both are recording errors.")).toBeTruthy();
    expect(within(box).queryByRole("button", { name: "Reply" })).toBeNull();
  });

  it("puts the comments on the study as a whole with the results", () => {
    renderWithProviders(<StepComments studyId={7} review={REVIEW} step="results" canReply={false} />);
    expect(screen.getByText("Say what the effect size means.")).toBeTruthy();
  });

  it("shows nothing on a step without comments", () => {
    renderWithProviders(<StepComments studyId={7} review={REVIEW} step="plan" canReply />);
    expect(screen.queryByTestId("step-comments")).toBeNull();
  });

  it("sends the analyst's reply to the comment's own address", async () => {
    const fetch = vi.fn(
      async () =>
        new Response(
          JSON.stringify({
            reply: {
              id: 2,
              commentId: 31,
              body: "Fixed.",
              author: person(1, "Ada Okafor"),
              createdAt: "2025-12-02T11:00:00Z",
            },
          }),
          { status: 201, headers: { "content-type": "application/json" } },
        ),
    );
    vi.stubGlobal("fetch", fetch);
    renderWithProviders(<StepComments studyId={7} review={REVIEW} step="checks" canReply />);
    fireEvent.click(screen.getByRole("button", { name: "Reply" }));
    expect(await screen.findByText("Write the reply")).toBeTruthy();
    expect(fetch).not.toHaveBeenCalled();
    fireEvent.change(screen.getByLabelText("Your reply"), { target: { value: "Fixed." } });
    fireEvent.click(screen.getByRole("button", { name: "Reply" }));
    await waitFor(() => expect(fetch).toHaveBeenCalled());
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/studies/7/comments/31/replies");
    expect(JSON.parse(String(init.body))).toEqual({ body: "Fixed." });
  });
});
