import { describe, expect, it } from "vitest";
import { decide, policy } from "./policy.js";
import { ROLES } from "./roles.js";

describe("decide (authorization policy)", () => {
  it("lets anyone through a public route, signed in or not", () => {
    expect(decide(policy.public, null)).toBe("allow");
    expect(decide(policy.public, { role: "writer", active: false })).toBe("allow");
  });

  it("asks signed-out callers to sign in on every other route", () => {
    expect(decide(policy.signedIn, null)).toBe("unauthenticated");
    expect(decide(policy.roles("admin"), undefined)).toBe("unauthenticated");
  });

  it("refuses a deactivated account even where its role would be allowed", () => {
    expect(decide(policy.signedIn, { role: "admin", active: false })).toBe("forbidden");
    expect(decide(policy.roles("admin"), { role: "admin", active: false })).toBe("forbidden");
  });

  it("allows exactly the listed roles", () => {
    const p = policy.roles("analyst", "reviewer");
    const allowed = ROLES.filter((role) => decide(p, { role, active: true }) === "allow");
    expect(allowed).toEqual(["analyst", "reviewer"]);
  });
});
