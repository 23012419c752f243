import { useMutation } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { PowerBody, PowerResponse as PowerResult } from "@waymark/contract";

export type { PowerBody };

export function computePower(body: PowerBody): Promise<PowerResult> {
  return api.post<PowerResult>("/power", { ...body });
}

export function useComputePower() {
  return useMutation({ mutationFn: computePower });
}
