import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { meQueryOptions, type User } from "@/lib/current-user";

export const loginInputSchema = z.object({
  email: z.email("Enter a valid e-mail address"),
  password: z.string().min(1, "Enter your password"),
});
export type LoginInput = z.infer<typeof loginInputSchema>;

export function login(input: LoginInput): Promise<{ user: User }> {
  return api.post("/auth/login", input);
}

export function useLogin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: ({ user }) => {
      qc.setQueryData(meQueryOptions.queryKey, user);
    },
  });
}
