import { z } from "zod";
import { LIMITS } from "./limits.js";
import { role } from "./enums.js";
import { person, timestamp } from "./common.js";

export const inviteBody = z.object({
  email: z.email("Enter a valid e-mail address").max(LIMITS.email),
  role,
});
export type InviteBody = z.infer<typeof inviteBody>;

export const acceptInvitationBody = z.object({
  displayName: z.string().trim().min(2, "Enter your name as colleagues know it").max(LIMITS.displayName),
  password: z.string().max(LIMITS.password),
});
export type AcceptInvitationBody = z.infer<typeof acceptInvitationBody>;

export const userPatchBody = z
  .object({ role: role.optional(), active: z.boolean().optional() })
  .strict()
  .refine((b) => b.role !== undefined || b.active !== undefined, "Give a role or an active flag");
export type UserPatchBody = z.infer<typeof userPatchBody>;

export const publicUser = z.object({
  id: z.number(),
  email: z.string(),
  displayName: z.string(),
  role,
  active: z.boolean(),
});
export type PublicUser = z.infer<typeof publicUser>;

/** A user account as the admin's list shows it. */
export const accountDto = publicUser.extend({
  lastSignInAt: timestamp.nullable(),
  createdAt: timestamp,
});
export type AccountDto = z.infer<typeof accountDto>;
export const userListResponse = z.object({ users: z.array(accountDto) });

export const INVITATION_STATES = ["open", "used", "expired", "revoked"] as const;
export const invitationState = z.enum(INVITATION_STATES);
export type InvitationState = z.infer<typeof invitationState>;

export const invitationDto = z.object({
  id: z.number(),
  email: z.string(),
  role,
  state: invitationState,
  createdAt: timestamp,
  expiresAt: timestamp,
  invitedBy: person.nullable(),
});
export type InvitationDto = z.infer<typeof invitationDto>;
