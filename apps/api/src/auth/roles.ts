/** The four roles of a Waymark organization. */
export const ROLES = ["analyst", "reviewer", "writer", "admin"] as const;
export type Role = (typeof ROLES)[number];
