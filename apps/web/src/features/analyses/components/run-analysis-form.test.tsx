import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { makeAnalysis } from "@/test/make-study";
import { routeFetch } from "@/test/study-harness";
import { RunAnalysisForm } from "./run-analysis-form";

afterEach(() => vi.unstubAllGlobals());

function setup() {
  const sent: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(
      routeFetch((method, path, body) =>
        method === "POST" && path === "/studies/7/analyses"
          ? (sent.push(body), { status: 201, body: { analysis: makeAnalysis() } })
          : undefined,
      ),
    ),
  );
  const onDone = vi.fn();
  renderWithProviders(
    <RunAnalysisForm studyId={7} datasetId={11} datasetVersion={1} primary="welch" onDone={onDone} />,
  );
  return { sent, onDone };
}

describe("RunAnalysisForm", () => {
  it("runs the plan's primary test without a justification", async () => {
    const { sent, onDone } = setup();
    fireEvent.click(screen.getByRole("button", { name: "Run the analysis" }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(sent).toEqual([{ datasetId: 11 }]);
  });

  it("another test is a deviation from the plan that needs a justification of at least 20 characters", async () => {
    const { sent, onDone } = setup();
    fireEvent.click(screen.getByLabelText(/A deviation from the plan: another test/));
    expect(await screen.findByText("A deviation from the plan")).toBeTruthy();
    fireEvent.change(screen.getByLabelText("Test to use"), { target: { value: "kruskal-wallis" } });
    fireEvent.input(screen.getByLabelText("Why this test instead"), { target: { value: "Too short." } });
    fireEvent.click(screen.getByRole("button", { name: "Run the analysis" }));
    expect(
      await screen.findByText("Write at least 20 characters on why you depart from the plan (10 so far)"),
    ).toBeTruthy();
    expect(sent).toEqual([]);

    const why = "The outcome is a 1–7 rating recorded by eye, so ranks suit it better.";
    fireEvent.input(screen.getByLabelText("Why this test instead"), { target: { value: why } });
    fireEvent.click(screen.getByRole("button", { name: "Run the analysis" }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(sent).toEqual([{ datasetId: 11, test: "kruskal-wallis", justification: why }]);
  });

  it("a deviation must name a test", async () => {
    const { sent } = setup();
    fireEvent.click(screen.getByLabelText(/A deviation from the plan: another test/));
    fireEvent.input(await screen.findByLabelText("Why this test instead"), {
      target: { value: "A long enough reason for the reviewer to read." },
    });
    fireEvent.click(screen.getByRole("button", { name: "Run the analysis" }));
    expect(await screen.findByText("Choose the test you want to use instead")).toBeTruthy();
    expect(sent).toEqual([]);
  });
});

describe("RunAnalysisForm when the plan's test cannot be computed", () => {
  it("does not offer it, and starts on the deviation with its justification", async () => {
    renderWithProviders(
      <RunAnalysisForm
        studyId={7}
        datasetId={11}
        datasetVersion={1}
        primary="welch"
        computable={false}
        onDone={vi.fn()}
      />,
    );
    const primary = screen.getByLabelText(/The plan's primary test/) as HTMLInputElement;
    expect(primary.disabled).toBe(true);
    expect(screen.getByText(/cannot be computed on these data/)).toBeTruthy();
    expect(await screen.findByText("A deviation from the plan")).toBeTruthy();
  });
});
