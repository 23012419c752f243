import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ALPHA_MESSAGE } from "@waymark/contract";
import { makeStudy } from "@/test/make-study";
import { renderWithStudy, routeFetch } from "@/test/study-harness";
import { PlanForm } from "./plan-form";

afterEach(() => vi.unstubAllGlobals());

const designed = makeStudy({
  designComplete: true,
  design: {
    independence: "independent",
    scale: "continuous",
    hasControl: "no",
    comparisons: "all-pairs",
    assignment: "randomized",
  },
});

describe("PlanForm", () => {
  it.each([
    ["", "Enter α as a number, for example 0.05"],
    ["0", ALPHA_MESSAGE],
    ["0.5", ALPHA_MESSAGE],
  ])("α of '%s' is refused with a message and nothing is sent", async (value, message) => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    renderWithStudy(designed, (s) => <PlanForm study={s} />);
    fireEvent.input(screen.getByLabelText("Significance level α"), { target: { value } });
    fireEvent.click(screen.getByRole("button", { name: "Save the plan" }));
    expect(await screen.findByText(message)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("sends the policy, adjustment and α", async () => {
    let sent: unknown;
    vi.stubGlobal(
      "fetch",
      vi.fn(
        routeFetch((method, path, body) =>
          method === "PUT" && path === "/studies/7/plan"
            ? ((sent = body), { body: { study: designed } })
            : undefined,
        ),
      ),
    );
    renderWithStudy(designed, (s) => <PlanForm study={s} />);
    fireEvent.click(screen.getByLabelText(/Welch's ANOVA first/));
    fireEvent.click(screen.getByLabelText(/^Bonferroni\./));
    fireEvent.input(screen.getByLabelText("Significance level α"), { target: { value: "0.01" } });
    fireEvent.click(screen.getByRole("button", { name: "Save the plan" }));
    await waitFor(() => expect(sent).toEqual({ policy: "welch-first", adjust: "bonferroni", alpha: 0.01 }));
  });
});
