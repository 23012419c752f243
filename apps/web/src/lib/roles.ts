import type { Role } from "@waymark/contract";

export { ROLES, type Role } from "@waymark/contract";

export const ROLE_LABELS: Record<Role, string> = {
  analyst: "Analyst",
  reviewer: "Reviewer",
  writer: "Writer",
  admin: "Admin",
};
