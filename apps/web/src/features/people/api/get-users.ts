import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { AccountDto as Account } from "@waymark/contract";
import { peopleKeys } from "./keys";

export function getUsers(): Promise<Account[]> {
  return api.get<{ users: Account[] }>("/users").then((r) => r.users);
}

export const usersQueryOptions = queryOptions({ queryKey: peopleKeys.users, queryFn: getUsers });

export function useUsers() {
  return useQuery(usersQueryOptions);
}
