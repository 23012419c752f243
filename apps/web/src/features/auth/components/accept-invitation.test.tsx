import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { meQueryOptions } from "@/lib/current-user";
import { AcceptInvitation } from "./accept-invitation";

afterEach(() => vi.unstubAllGlobals());

const json = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status });
const INVITATION = {
  email: "new.reviewer@waymark.test",
  role: "reviewer",
  expiresAt: "2025-12-12T10:00:00Z",
};

describe("AcceptInvitation", () => {
  it("shows a clear page for an expired link, not an error dump", async () => {
    const message = "This invitation expired (links last 72 hours). Ask your admin to invite you again.";
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => json({ error: { code: "invitation_expired", message } }, 410)),
    );
    renderWithProviders(<AcceptInvitation token="abc" onAccepted={() => undefined} />);
    expect(await screen.findByRole("heading", { name: "This invitation has expired" })).toBeTruthy();
    expect(screen.getByText(message)).toBeTruthy();
    expect(screen.queryByLabelText("Password")).toBeNull();
    expect(document.body.textContent).not.toMatch(/410|invitation_expired|undefined/);
  });

  it("shows the invited e-mail and role and checks the passwords before sending", async () => {
    const fetchMock = vi.fn(async () => json({ invitation: INVITATION }));
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<AcceptInvitation token="abc" onAccepted={() => undefined} />);
    expect((await screen.findByTestId("invited-email")).textContent).toBe(INVITATION.email);
    expect(screen.getByText("Reviewer")).toBeTruthy();
    fireEvent.input(screen.getByLabelText("Your name"), { target: { value: "Noor Haddad" } });
    fireEvent.input(screen.getByLabelText("Password"), { target: { value: "short" } });
    fireEvent.input(screen.getByLabelText("Password again"), { target: { value: "other" } });
    fireEvent.click(screen.getByRole("button", { name: "Create account and sign in" }));
    expect(await screen.findByText("Use at least 12 characters")).toBeTruthy();
    expect(screen.getByText("The two passwords differ")).toBeTruthy();
    expect(fetchMock).toHaveBeenCalledTimes(1);
  });

  it("shows the server's reason under the password and, on success, signs the person in", async () => {
    const user = {
      id: 9,
      email: INVITATION.email,
      displayName: "Noor Haddad",
      role: "reviewer",
      active: true,
    };
    let attempt = 0;
    vi.stubGlobal(
      "fetch",
      vi.fn(async (url: string) => {
        if (!url.endsWith("/accept")) return json({ invitation: INVITATION });
        attempt += 1;
        return attempt === 1
          ? json(
              {
                error: {
                  code: "weak_password",
                  message:
                    "password: This password is too common or too easy to guess; try a longer phrase of unrelated words.",
                },
              },
              400,
            )
          : json({ user }, 201);
      }),
    );
    const onAccepted = vi.fn();
    const { client } = renderWithProviders(<AcceptInvitation token="abc" onAccepted={onAccepted} />);
    fireEvent.input(await screen.findByLabelText("Your name"), { target: { value: "Noor Haddad" } });
    fireEvent.input(screen.getByLabelText("Password"), { target: { value: "password1234" } });
    fireEvent.input(screen.getByLabelText("Password again"), { target: { value: "password1234" } });
    fireEvent.click(screen.getByRole("button", { name: "Create account and sign in" }));
    expect(await screen.findByText(/too common or too easy to guess/)).toBeTruthy();
    expect(screen.queryByText(/^password:/)).toBeNull();
    fireEvent.input(screen.getByLabelText("Password"), { target: { value: "lantern orchard gravel tide" } });
    fireEvent.input(screen.getByLabelText("Password again"), {
      target: { value: "lantern orchard gravel tide" },
    });
    fireEvent.click(screen.getByRole("button", { name: "Create account and sign in" }));
    await waitFor(() => expect(onAccepted).toHaveBeenCalledTimes(1));
    expect(client.getQueryData(meQueryOptions.queryKey)).toEqual(user);
  });
});
