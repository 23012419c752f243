import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Role } from "@/lib/roles";

export interface InvitationDetails {
  email: string;
  role: Role;
  expiresAt: string;
}

/** What an invitation link is for; 404 and 410 come back as ApiErrors with the reason in words. */
export function getInvitation(token: string): Promise<InvitationDetails> {
  return api
    .get<{ invitation: InvitationDetails }>(`/invitations/${encodeURIComponent(token)}`)
    .then((r) => r.invitation);
}

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ["invitations", "token", token],
    queryFn: () => getInvitation(token),
    staleTime: Infinity,
  });

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
