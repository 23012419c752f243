import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { RequestChangesForm } from "./request-changes-form";

afterEach(() => vi.unstubAllGlobals());

describe("RequestChangesForm", () => {
  it("requires a comment before calling the server", async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<RequestChangesForm studyId={3} />);
    fireEvent.input(screen.getByLabelText("What needs to change"), { target: { value: "   " } });
    fireEvent.click(screen.getByRole("button", { name: "Send back to the analyst" }));
    expect(await screen.findByText("Say what needs to change")).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("sends the comment, the step and only the step comments that were filled in", async () => {
    const fetchMock = vi.fn(
      async () => new Response(JSON.stringify({ study: { id: 3, status: "draft" } }), { status: 200 }),
    );
    vi.stubGlobal("fetch", fetchMock);
    const onSent = vi.fn();
    renderWithProviders(<RequestChangesForm studyId={3} onSent={onSent} />);
    fireEvent.input(screen.getByLabelText("What needs to change"), {
      target: { value: "Explain the override." },
    });
    fireEvent.change(screen.getByLabelText("Mainly about"), { target: { value: "choice" } });
    fireEvent.input(screen.getByLabelText("Checks step"), {
      target: { value: "Two outliers in group B are not discussed." },
    });
    fireEvent.click(screen.getByRole("button", { name: "Send back to the analyst" }));
    await waitFor(() => expect(onSent).toHaveBeenCalledTimes(1));
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/studies/3/request-changes");
    expect(JSON.parse(String(init.body))).toEqual({
      comment: "Explain the override.",
      step: "choice",
      stepComments: [{ step: "checks", body: "Two outliers in group B are not discussed." }],
    });
  });
});
