import { z } from "zod";

export const loginSchema = z.object({
  email: z.email("Enter a valid e-mail address").max(254),
  password: z.string().min(1, "Enter your password").max(200),
});

export const passwordChangeSchema = z.object({
  currentPassword: z.string().min(1, "Enter your current password").max(200),
  newPassword: z.string().max(200),
});
