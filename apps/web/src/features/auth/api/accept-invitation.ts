import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { meQueryOptions, type User } from "@/lib/current-user";

export const MIN_PASSWORD_LENGTH = 12;

export const acceptInvitationSchema = z
  .object({
    displayName: z
      .string()
      .trim()
      .min(2, "Enter your name as colleagues know it")
      .max(120, "Use at most 120 characters"),
    password: z
      .string()
      .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters`)
      .max(200, "Use at most 200 characters"),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

export function acceptInvitation(
  token: string,
  input: { displayName: string; password: string },
): Promise<User> {
  return api
    .post<{ user: User }>(`/invitations/${encodeURIComponent(token)}/accept`, input)
    .then((r) => r.user);
}

/** Creates the invited account; the server signs the browser in, so the signed-in user is set. */
export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { displayName: string; password: string }) => acceptInvitation(token, input),
    onSuccess: (user) => {
      // Whatever another account had cached in this tab is not the new person's; the invitation
      // query stays so the page does not flash "used" before it moves on.
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== "invitations" });
      qc.setQueryData(meQueryOptions.queryKey, user);
    },
  });
}
