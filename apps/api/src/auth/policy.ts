import type { Role } from "./roles.js";

/** Who may call a route. Every route declares one; the route table refuses a route without. */
export type Policy = { kind: "public" } | { kind: "signed-in" } | { kind: "roles"; roles: readonly Role[] };

export const policy = {
  public: { kind: "public" } as Policy,
  signedIn: { kind: "signed-in" } as Policy,
  roles: (...roles: Role[]): Policy => ({ kind: "roles", roles }),
};

export interface Caller {
  role: Role;
  active: boolean;
}

export type Decision = "allow" | "unauthenticated" | "forbidden";

/** Pure decision: signed out → unauthenticated; deactivated or wrong role → forbidden. */
export function decide(p: Policy, caller: Caller | null | undefined): Decision {
  if (p.kind === "public") return "allow";
  if (!caller) return "unauthenticated";
  if (!caller.active) return "forbidden";
  if (p.kind === "signed-in") return "allow";
  return p.roles.includes(caller.role) ? "allow" : "forbidden";
}

export function describePolicy(p: Policy): string {
  if (p.kind === "public") return "anyone";
  if (p.kind === "signed-in") return "any signed-in user";
  return p.roles.join(", ");
}
