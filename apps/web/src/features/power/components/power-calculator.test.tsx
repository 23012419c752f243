import { fireEvent, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { makeStudy } from "@/test/make-study";
import { renderWithStudy, routeFetch } from "@/test/study-harness";
import { PowerCalculator, type PlanSaver } from "./power-calculator";

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

// The plan's mutation belongs to the studies feature; here it is a stand-in that records calls.
const save: PlanSaver = { mutate: vi.fn(), isPending: false, isSuccess: false, error: null };

describe("PowerCalculator", () => {
  it("names each invalid input", async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    renderWithStudy(designed, (s) => <PowerCalculator study={s} editable save={save} />);
    fireEvent.input(screen.getByLabelText("Cohen's f"), { target: { value: "0" } });
    fireEvent.input(screen.getByLabelText("Target power"), { target: { value: "0.3" } });
    fireEvent.click(screen.getByRole("button", { name: "Calculate" }));
    expect(await screen.findByText("Cohen's f must be above 0")).toBeTruthy();
    expect(screen.getByText("Target power must be between 0.50 and 0.99")).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("asks for one expected mean per group and a positive SD", async () => {
    vi.stubGlobal("fetch", vi.fn());
    renderWithStudy(designed, (s) => <PowerCalculator study={s} editable save={save} />);
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
    renderWithStudy(designed, (s) => <PowerCalculator study={s} editable save={save} />);
    fireEvent.click(screen.getByRole("button", { name: "Calculate" }));
    const text = (await screen.findByTestId("power-answer")).textContent ?? "";
    expect(text).toMatch(/n = 53 per group/);
    expect(text).toMatch(/159 in total/);
    expect(text).not.toMatch(/NaN|undefined/);
  });
});
