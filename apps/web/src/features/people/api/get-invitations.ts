import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { InvitationDto as Invitation } from "@waymark/contract";
import { peopleKeys } from "./keys";

export function getInvitations(): Promise<Invitation[]> {
  return api.get<{ invitations: Invitation[] }>("/invitations").then((r) => r.invitations);
}

export const invitationsQueryOptions = queryOptions({
  queryKey: peopleKeys.invitations,
  queryFn: getInvitations,
});

export function useInvitations() {
  return useQuery(invitationsQueryOptions);
}
