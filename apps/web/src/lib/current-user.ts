import { queryOptions, useQuery } from "@tanstack/react-query";
import { api, ApiError } from "./api-client";
import type { Role } from "./roles";

export interface User {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  active: boolean;
}

/** The signed-in user, or null when signed out (401 is an answer here, not an error). */
export async function getMe(): Promise<User | null> {
  try {
    const { user } = await api.get<{ user: User }>("/auth/me");
    return user;
  } catch (e) {
    if (e instanceof ApiError && e.status === 401) return null;
    throw e;
  }
}

export const meQueryOptions = queryOptions({ queryKey: ["auth", "me"], queryFn: getMe, staleTime: 60_000 });

export function useMe() {
  return useQuery(meQueryOptions);
}
