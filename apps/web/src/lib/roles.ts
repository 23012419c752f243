export const ROLES = ["analyst", "reviewer", "writer", "admin"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  analyst: "Analyst",
  reviewer: "Reviewer",
  writer: "Writer",
  admin: "Admin",
};
