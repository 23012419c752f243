import { useMutation } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { PowerResult } from "@/features/studies/types";

export interface PowerBody {
  k: number;
  alpha: number;
  effectF?: number;
  means?: number[];
  sd?: number;
  power?: number;
  n?: number;
}

export function computePower(body: PowerBody): Promise<PowerResult> {
  return api.post<PowerResult>("/power", { ...body });
}

export function useComputePower() {
  return useMutation({ mutationFn: computePower });
}
