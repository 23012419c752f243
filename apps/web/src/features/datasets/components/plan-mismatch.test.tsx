import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { makeDataset } from "@/test/make-study";
import { DatasetVersions } from "./dataset-versions";
import { PlanMismatch } from "./plan-mismatch";

afterEach(() => vi.unstubAllGlobals());

// The shape apps/api/src/modules/datasets/match-plan.ts sends with a 422 data_does_not_match_plan.
const DETAILS = {
  missing: ["Sealed Dock", "Open Yard"],
  tooSmall: [{ level: "Cold Store", n: 1 }],
  unplanned: ["sealed dock", "loading bay"],
  suggestions: [{ found: "sealed dock", planned: "Sealed Dock" }],
};
const LEVELS = ["Sealed Dock", "Open Yard", "Cold Store"];

describe("PlanMismatch", () => {
  it("lists what is missing, too small and unplanned", () => {
    renderWithProviders(<PlanMismatch details={DETAILS} levels={LEVELS} busy={false} onResend={() => {}} />);
    expect(screen.getByText(/No data for the planned levels “Sealed Dock”, “Open Yard”/)).toBeTruthy();
    expect(screen.getByText(/“Cold Store” has 1 value; every group needs at least two/)).toBeTruthy();
    expect(screen.getByText(/the plan does not name: “sealed dock”, “loading bay”/)).toBeTruthy();
  });

  it("offers the suggested mapping, leaves other names out unless told, and sends the choice", () => {
    const onResend = vi.fn();
    renderWithProviders(<PlanMismatch details={DETAILS} levels={LEVELS} busy={false} onResend={onResend} />);
    expect((screen.getByLabelText("What “sealed dock” means") as HTMLSelectElement).value).toBe(
      "Sealed Dock",
    );
    // "Open Yard" is still missing with the default choice: the panel says the file will be refused.
    expect(screen.getByText(/“Open Yard” still has no data/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText("What “loading bay” means"), { target: { value: "Open Yard" } });
    expect(screen.queryByText(/still has no data/)).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Upload again with this mapping" }));
    expect(onResend).toHaveBeenCalledWith({ "sealed dock": "Sealed Dock", "loading bay": "Open Yard" });
  });

  it("sends null for a group left out on purpose", () => {
    const onResend = vi.fn();
    renderWithProviders(<PlanMismatch details={DETAILS} levels={LEVELS} busy={false} onResend={onResend} />);
    fireEvent.click(screen.getByRole("button", { name: "Upload again with this mapping" }));
    expect(onResend).toHaveBeenCalledWith({ "sealed dock": "Sealed Dock", "loading bay": null });
  });
});

describe("DatasetVersions", () => {
  it("marks the active version and makes another one active through the API", async () => {
    const fetch = vi.fn(
      async () =>
        new Response(JSON.stringify({ dataset: makeDataset() }), {
          status: 200,
          headers: { "content-type": "application/json" },
        }),
    );
    vi.stubGlobal("fetch", fetch);
    renderWithProviders(
      <DatasetVersions
        studyId={7}
        canActivate
        datasets={[
          { ...makeDataset(), active: false },
          { ...makeDataset({ id: 12, version: 2 }), active: true },
        ]}
      />,
    );
    expect(screen.getByTestId("version-2").textContent).toContain("Active");
    expect(screen.queryByRole("button", { name: "Make version 2 active" })).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Make version 1 active" }));
    await waitFor(() => expect(fetch).toHaveBeenCalled());
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/studies/7/datasets/11/activate");
    expect(init.method).toBe("POST");
  });

  it("offers no switch to someone who may not change the study", () => {
    renderWithProviders(<DatasetVersions studyId={7} datasets={[{ ...makeDataset(), active: false }]} />);
    expect(screen.queryByRole("button", { name: /Make version/ })).toBeNull();
  });
});
