import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { PeoplePage } from "./people-page";

afterEach(() => vi.unstubAllGlobals());

const json = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status });
const ADMIN = {
  id: 4,
  email: "admin@waymark.test",
  displayName: "Amal Reyes",
  role: "admin",
  active: true,
  lastSignInAt: "2025-12-09T08:00:00Z",
  createdAt: "2025-12-01T08:00:00Z",
};
const ANALYST = {
  id: 1,
  email: "analyst@waymark.test",
  displayName: "Ada Okafor",
  role: "analyst",
  active: true,
  lastSignInAt: null,
  createdAt: "2025-12-01T08:00:00Z",
};
const LAST_ADMIN = "This is the last active admin; make someone else an admin first.";

function server() {
  const calls: { method: string; url: string; body?: unknown }[] = [];
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    const method = init?.method ?? "GET";
    calls.push({ method, url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
    if (url === "/api/users" && method === "GET") return json({ users: [ADMIN, ANALYST] });
    if (url === "/api/invitations" && method === "GET")
      return json({
        invitations: [
          {
            id: 9,
            email: "new@waymark.test",
            role: "reviewer",
            state: "expired",
            createdAt: "2025-12-01T08:00:00Z",
            expiresAt: "2025-12-04T08:00:00Z",
            invitedBy: { id: 4, displayName: "Amal Reyes" },
          },
        ],
      });
    if (url === "/api/users/4" && method === "PATCH")
      return json({ error: { code: "conflict", message: LAST_ADMIN } }, 409);
    if (url === "/api/invitations" && method === "POST")
      return json(
        { error: { code: "conflict", message: "analyst@waymark.test already has an account." } },
        409,
      );
    return json({ error: { code: "not_found", message: "no" } }, 404);
  });
  vi.stubGlobal("fetch", fetchMock);
  return calls;
}

describe("PeoplePage", () => {
  it("lists accounts and invitations with their states in words", async () => {
    server();
    renderWithProviders(<PeoplePage />);
    const users = await screen.findByTestId("users-table");
    expect(within(users).getByText("Amal Reyes")).toBeTruthy();
    expect(within(users).getByText("Never")).toBeTruthy();
    expect(within(await screen.findByTestId("invitations-table")).getByText("Expired")).toBeTruthy();
  });

  it("asks before deactivating and shows the server's message for the last admin", async () => {
    const calls = server();
    renderWithProviders(<PeoplePage />);
    fireEvent.click(await screen.findByRole("button", { name: "Deactivate Amal Reyes" }));
    expect(calls.some((c) => c.method === "PATCH")).toBe(false);
    fireEvent.click(screen.getByRole("button", { name: "Yes, deactivate" }));
    expect(await screen.findByText(LAST_ADMIN)).toBeTruthy();
    expect(calls.find((c) => c.method === "PATCH")).toEqual({
      method: "PATCH",
      url: "/api/users/4",
      body: { active: false },
    });
  });

  it("asks before changing a role, and keeping it sends nothing", async () => {
    const calls = server();
    renderWithProviders(<PeoplePage />);
    fireEvent.change(await screen.findByLabelText("Role of Ada Okafor"), { target: { value: "reviewer" } });
    const confirm = screen.getByRole("group", { name: "Confirm: change the role of Ada Okafor" });
    expect(within(confirm).getByText(/Ada Okafor will be a reviewer instead of an analyst/)).toBeTruthy();
    expect(calls.some((c) => c.method === "PATCH")).toBe(false);
    fireEvent.click(within(confirm).getByRole("button", { name: "Keep as is" }));
    expect((screen.getByLabelText("Role of Ada Okafor") as HTMLSelectElement).value).toBe("analyst");
    expect(calls.some((c) => c.method === "PATCH")).toBe(false);
  });

  it("shows the last-admin message when the confirmed role change is refused", async () => {
    const calls = server();
    renderWithProviders(<PeoplePage />);
    fireEvent.change(await screen.findByLabelText("Role of Amal Reyes"), { target: { value: "reviewer" } });
    fireEvent.click(screen.getByRole("button", { name: "Yes, change the role" }));
    expect(await screen.findByText(LAST_ADMIN)).toBeTruthy();
    expect(calls.find((c) => c.method === "PATCH")).toEqual({
      method: "PATCH",
      url: "/api/users/4",
      body: { role: "reviewer" },
    });
    await waitFor(() =>
      expect((screen.getByLabelText("Role of Amal Reyes") as HTMLSelectElement).value).toBe("admin"),
    );
  });

  it("shows why an invitation was not sent", async () => {
    server();
    renderWithProviders(<PeoplePage />);
    const form = screen.getByRole("form", { name: "Invite a person" });
    fireEvent.input(within(form).getByLabelText("E-mail"), { target: { value: "analyst@waymark.test" } });
    fireEvent.click(within(form).getByRole("button", { name: "Send invitation" }));
    expect(await screen.findByText("analyst@waymark.test already has an account.")).toBeTruthy();
  });
});
