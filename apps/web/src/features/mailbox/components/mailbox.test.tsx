import { fireEvent, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { Mailbox } from "./mailbox";

afterEach(() => vi.unstubAllGlobals());

const MESSAGE = {
  id: 3,
  to: "new@waymark.test",
  from: "waymark@localhost",
  subject: "Waymark: Amal Reyes invited you as reviewer",
  text: "Hello there,\n\nAccept the invitation: http://localhost:3100/invite/tok_123\n\n<b>not bold</b>",
  html: "<p>Hello <script>alert(1)</script></p>",
  receivedAt: "2025-12-10T10:00:00Z",
};

describe("Mailbox", () => {
  it("lists messages, opens one with clickable links, and keeps the HTML in a sandbox", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => new Response(JSON.stringify({ messages: [MESSAGE] }), { status: 200 })),
    );
    renderWithProviders(<Mailbox />);
    fireEvent.click(await screen.findByRole("button", { name: /invited you as reviewer/ }));
    const text = screen.getByTestId("mail-text");
    expect(
      within(text).getByRole("link", { name: "http://localhost:3100/invite/tok_123" }).getAttribute("href"),
    ).toBe("http://localhost:3100/invite/tok_123");
    expect(text.textContent).toContain("<b>not bold</b>");
    fireEvent.click(screen.getByRole("button", { name: "Formatted (HTML)" }));
    const frame = screen.getByTitle("The message as HTML");
    expect(frame.getAttribute("sandbox")).toBe("");
    expect(document.querySelector("script")).toBeNull();
  });

  it("explains that the mailbox is off outside demo mode", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(
        async () =>
          new Response(JSON.stringify({ error: { code: "not_found", message: "No such route" } }), {
            status: 404,
          }),
      ),
    );
    renderWithProviders(<Mailbox />);
    expect(await screen.findByText("The mailbox is off")).toBeTruthy();
  });
});
