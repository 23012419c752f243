import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { makeStudy } from "@/test/make-study";
import { renderWithStudy, routeFetch } from "@/test/study-harness";
import { PlanForm } from "./plan-form";
import { PowerCalculator } from "@/features/power/components/power-calculator";

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
    ["0", "α must be above 0"],
    ["0.5", "α must be at most 0.2; a larger false-alarm rate would not be accepted as evidence"],
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

describe("PowerCalculator", () => {
  it("names each invalid input", async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    renderWithStudy(designed, (s) => <PowerCalculator study={s} editable />);
    fireEvent.input(screen.getByLabelText("Cohen's f"), { target: { value: "0" } });
    fireEvent.input(screen.getByLabelText("Target power"), { target: { value: "0.3" } });
    fireEvent.click(screen.getByRole("button", { name: "Calculate" }));
    expect(await screen.findByText("Cohen's f must be above 0")).toBeTruthy();
    expect(screen.getByText("Target power must be between 0.50 and 0.99")).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("asks for one expected mean per group and a positive SD", async () => {
    vi.stubGlobal("fetch", vi.fn());
    renderWithStudy(designed, (s) => <PowerCalculator study={s} editable />);
    fireEvent.click(screen.getByLabelText("expected means and a common SD"));
    fireEvent.input(await screen.findByLabelText("Expected means"), { target: { value: "20, 22" } });
    fireEvent.input(screen.getByLabelText("Common SD"), { target: { value: "-1" } });
    fireEvent.click(screen.getByRole("button", { name: "Calculate" }));
    expect(await screen.findByText("Enter one expected mean per group: 3 needed, 2 given")).toBeTruthy();
    expect(screen.getByText("The common SD must be above 0")).toBeTruthy();
  });

  it("shows n per group from the server's answer", async () => {
    const answer = {
      k: 3,
      effectF: 0.25,
      alpha: 0.05,
      nPerGroup: 53,
      totalN: 159,
      power: 0.8049,
      curve: [
        { n: 2, power: 0.06 },
        { n: 53, power: 0.8049 },
        { n: 106, power: 0.99 },
      ],
    };
    vi.stubGlobal(
      "fetch",
      vi.fn(
        routeFetch((method, path) => (method === "POST" && path === "/power" ? { body: answer } : undefined)),
      ),
    );
    renderWithStudy(designed, (s) => <PowerCalculator study={s} editable />);
    fireEvent.click(screen.getByRole("button", { name: "Calculate" }));
    const text = (await screen.findByTestId("power-answer")).textContent ?? "";
    expect(text).toMatch(/n = 53 per group/);
    expect(text).toMatch(/159 in total/);
    expect(text).not.toMatch(/NaN|undefined/);
  });
});
