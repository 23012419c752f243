import type { ReactNode } from "react";
import { useMe } from "./current-user";
import type { Role } from "./roles";

/** What each role may see in the web app; the API enforces the same rules on its side. */
export const POLICIES = {
  "home:view": ["analyst", "reviewer", "writer", "admin"],
  "studies:view": ["analyst", "reviewer", "writer", "admin"],
  "studies:create": ["analyst"],
  "reviews:view": ["reviewer", "admin"],
  "audit:view": ["reviewer", "admin"],
  "people:manage": ["admin"],
  "settings:manage": ["admin"],
  "reports:view": ["writer", "reviewer", "admin"],
  "reports:list": ["writer"],
  "mailbox:view": ["analyst", "reviewer", "writer", "admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof POLICIES;

export function can(role: Role | undefined, permission: Permission): boolean {
  return !!role && (POLICIES[permission] as readonly Role[]).includes(role);
}

/** Renders its children only for roles that hold the permission. */
export function Authorization({
  permission,
  children,
  fallback = null,
}: {
  permission: Permission;
  children: ReactNode;
  fallback?: ReactNode;
}) {
  const me = useMe();
  return can(me.data?.role, permission) ? <>{children}</> : <>{fallback}</>;
}
