import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { ROLES } from "@/lib/roles";
import type { InvitationDto as Invitation } from "@waymark/contract";
import { peopleKeys } from "./keys";

export const inviteInputSchema = z.object({
  email: z.email("Enter a valid e-mail address").max(254, "Use at most 254 characters"),
  role: z.enum(ROLES, "Choose a role"),
});
export type InviteInput = z.infer<typeof inviteInputSchema>;

export function createInvitation(input: InviteInput): Promise<Invitation> {
  return api.post<{ invitation: Invitation }>("/invitations", input).then((r) => r.invitation);
}

/** Sends an invitation; the invitations list is refreshed. */
export function useCreateInvitation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: () => void qc.invalidateQueries({ queryKey: peopleKeys.invitations }),
  });
}
