/** The four roles of a Waymark organization. */
export { ROLES, type Role } from "@waymark/contract";
