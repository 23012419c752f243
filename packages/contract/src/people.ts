import { z } from "zod";
import { LIMITS } from "./limits.js";
import { role } from "./enums.js";

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
