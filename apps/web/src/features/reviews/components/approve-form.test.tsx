import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { DEFAULT_MEANING } from "../api/approve-study";
import { ApproveForm } from "./approve-form";

afterEach(() => vi.unstubAllGlobals());

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

describe("ApproveForm", () => {
  it("offers a starting meaning and explains what signing records", () => {
    vi.stubGlobal("fetch", vi.fn());
    renderWithProviders(<ApproveForm studyId={7} signerName="Rui Takahashi" />);
    expect((screen.getByLabelText("Meaning of your signature") as HTMLTextAreaElement).value).toBe(
      DEFAULT_MEANING,
    );
    const explainer = screen.getByTestId("signature-explainer").textContent ?? "";
    expect(explainer).toContain("Rui Takahashi");
    expect(explainer).toMatch(/name.*time.*meaning.*hash/s);
  });

  it("requires the password and a meaning before calling the server", async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<ApproveForm studyId={7} signerName="Rui Takahashi" />);
    fireEvent.input(screen.getByLabelText("Meaning of your signature"), { target: { value: "" } });
    fireEvent.click(screen.getByRole("button", { name: "Sign and approve" }));
    expect(await screen.findByText("Re-enter your password to sign")).toBeTruthy();
    expect(screen.getByText(/State what your signature means/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("shows the server's wrong-password message under the password and sends password and meaning", async () => {
    const message = "The password is not correct, so the approval was not signed.";
    const fetchMock = vi.fn(async () => json({ error: { code: "signature_rejected", message } }, 403));
    vi.stubGlobal("fetch", fetchMock);
    const onApproved = vi.fn();
    renderWithProviders(<ApproveForm studyId={7} signerName="Rui Takahashi" onApproved={onApproved} />);
    fireEvent.input(screen.getByLabelText("Your password"), { target: { value: "not-mine" } });
    fireEvent.click(screen.getByRole("button", { name: "Sign and approve" }));
    expect(await screen.findByText(message)).toBeTruthy();
    expect(screen.getByLabelText("Your password").getAttribute("aria-invalid")).toBe("true");
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/studies/7/approve");
    expect(JSON.parse(String(init.body))).toEqual({ password: "not-mine", meaning: DEFAULT_MEANING });
    expect(onApproved).not.toHaveBeenCalled();
  });

  it("shows a separation-of-duties refusal in place", async () => {
    const message = "You created this study, so someone else must review it (separation of duties).";
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => json({ error: { code: "forbidden", message } }, 403)),
    );
    renderWithProviders(<ApproveForm studyId={7} signerName="Rui Takahashi" />);
    fireEvent.input(screen.getByLabelText("Your password"), { target: { value: "right-one" } });
    fireEvent.click(screen.getByRole("button", { name: "Sign and approve" }));
    expect(await screen.findByText(message)).toBeTruthy();
    expect(screen.getByText("The approval was not recorded")).toBeTruthy();
  });

  it("calls onApproved after the signature is recorded", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => json({ study: { id: 7, status: "approved" } })),
    );
    const onApproved = vi.fn();
    renderWithProviders(<ApproveForm studyId={7} signerName="Rui Takahashi" onApproved={onApproved} />);
    fireEvent.input(screen.getByLabelText("Your password"), { target: { value: "right-one" } });
    fireEvent.click(screen.getByRole("button", { name: "Sign and approve" }));
    await waitFor(() => expect(onApproved).toHaveBeenCalledTimes(1));
  });
});
