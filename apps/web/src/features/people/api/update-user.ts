import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Role } from "@/lib/roles";
import type { AccountDto as Account } from "@waymark/contract";
import { peopleKeys } from "./keys";

export type UserChange = { role: Role } | { active: boolean };

export function updateUser(id: number, change: UserChange): Promise<Account> {
  return api.patch<{ user: Account }>(`/users/${id}`, change).then((r) => r.user);
}

/** Changes one account's role or active flag; the users list is refreshed. */
export function useUpdateUser(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (change: UserChange) => updateUser(id, change),
    onSuccess: () => void qc.invalidateQueries({ queryKey: peopleKeys.users }),
  });
}
