import { fireEvent, screen, waitFor } from "@testing-library/react";
import { ALPHA_MESSAGE } from "@waymark/contract";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { SettingsForm } from "./settings-form";

afterEach(() => vi.unstubAllGlobals());

const SETTINGS = {
  policy: "welch-first",
  defaultAlpha: 0.05,
  defaultAdjust: "holm",
  paperSize: "A4",
  updatedAt: "2025-12-01T09:00:00.000Z",
} as const;

describe("SettingsForm", () => {
  it("explains each policy in one line and saves the changed values", async () => {
    const fetchMock = vi.fn(
      async (_url: string, init?: RequestInit) =>
        new Response(JSON.stringify({ settings: JSON.parse(String(init?.body)) }), { status: 200 }),
    );
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<SettingsForm settings={SETTINGS} />);
    // The policies are described in the vocabulary's words (the plan form shows the same).
    expect(
      screen.getByText(/move to Welch's ANOVA only when the groups' spread clearly differs/),
    ).toBeTruthy();
    expect(screen.getByText(/holds its error rate when spreads differ/)).toBeTruthy();
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
    await waitFor(() => expect(screen.getByText(ALPHA_MESSAGE)).toBeTruthy());
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
