import { z } from "zod";
import { LIMITS } from "./limits.js";

export const loginBody = z.object({
  email: z.email("Enter a valid e-mail address").max(LIMITS.email),
  password: z.string().min(1, "Enter your password").max(LIMITS.password),
});
export type LoginBody = z.infer<typeof loginBody>;

export const passwordChangeBody = z.object({
  currentPassword: z.string().min(1, "Enter your current password").max(LIMITS.password),
  newPassword: z.string().max(LIMITS.password),
});
export type PasswordChangeBody = z.infer<typeof passwordChangeBody>;
