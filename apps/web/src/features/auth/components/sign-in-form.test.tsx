import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { SignInForm } from "./sign-in-form";

afterEach(() => vi.unstubAllGlobals());

describe("SignInForm", () => {
  it("names the missing fields without calling the server", async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<SignInForm onSignedIn={() => undefined} />);
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText("Enter a valid e-mail address")).toBeTruthy();
    expect(screen.getByText("Enter your password")).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("shows the server's message when the password is wrong", async () => {
    const body = {
      error: { code: "invalid_credentials", message: "That e-mail and password do not match an account." },
    };
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => new Response(JSON.stringify(body), { status: 401 })),
    );
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    fireEvent.input(screen.getByLabelText("E-mail"), { target: { value: "analyst@waymark.test" } });
    fireEvent.input(screen.getByLabelText("Password"), { target: { value: "wrong" } });
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText(body.error.message)).toBeTruthy();
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it("calls onSignedIn after a successful sign-in", async () => {
    const user = {
      id: 1,
      email: "analyst@waymark.test",
      displayName: "Ada Okafor",
      role: "analyst",
      active: true,
    };
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => new Response(JSON.stringify({ user }), { status: 200 })),
    );
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    fireEvent.input(screen.getByLabelText("E-mail"), { target: { value: user.email } });
    fireEvent.input(screen.getByLabelText("Password"), { target: { value: "secret" } });
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledTimes(1));
  });
});
