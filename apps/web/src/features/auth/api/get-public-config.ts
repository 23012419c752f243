import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Role } from "@/lib/roles";

export interface PublicConfig {
  demo: boolean;
  demoPassword?: string;
  demoAccounts?: { email: string; role: Role }[];
}

export const publicConfigQueryOptions = queryOptions({
  queryKey: ["config"],
  queryFn: () => api.get<PublicConfig>("/config"),
  staleTime: Infinity,
});

export function usePublicConfig() {
  return useQuery(publicConfigQueryOptions);
}
