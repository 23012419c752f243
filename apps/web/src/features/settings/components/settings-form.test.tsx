import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { SettingsForm } from "./settings-form";

afterEach(() => vi.unstubAllGlobals());

const SETTINGS = {
  policy: "welch-first",
  defaultAlpha: 0.05,
  defaultAdjust: "holm",
  paperSize: "A4",
} as const;

describe("SettingsForm", () => {
  it("explains each policy in one line and saves the changed values", async () => {
    const fetchMock = vi.fn(
      async (_url: string, init?: RequestInit) =>
        new Response(JSON.stringify({ settings: JSON.parse(String(init?.body)) }), { status: 200 }),
    );
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<SettingsForm settings={SETTINGS} />);
    expect(screen.getByText(/unless the groups' spreads differ; then Welch's ANOVA/)).toBeTruthy();
    expect(screen.getByText(/Delacre et al., 2019/)).toBeTruthy();
    fireEvent.click(screen.getByLabelText(/Classic ANOVA first/));
    fireEvent.click(screen.getByLabelText(/Benjamini–Hochberg/));
    fireEvent.input(screen.getByLabelText("Default significance level (α)"), { target: { value: "0.01" } });
    fireEvent.click(screen.getByRole("button", { name: "Save settings" }));
    expect(await screen.findByRole("status")).toBeTruthy();
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/organization/settings");
    expect(init.method).toBe("PUT");
    expect(JSON.parse(String(init.body))).toEqual({
      policy: "classic-first",
      defaultAlpha: 0.01,
      defaultAdjust: "bh",
      paperSize: "A4",
    });
  });

  it("refuses an α that is not a usual significance level", async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<SettingsForm settings={SETTINGS} />);
    fireEvent.input(screen.getByLabelText("Default significance level (α)"), { target: { value: "0.5" } });
    fireEvent.click(screen.getByRole("button", { name: "Save settings" }));
    await waitFor(() => expect(screen.getByText("Use an α above 0 and at most 0.20")).toBeTruthy());
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
