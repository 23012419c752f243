import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";

export type TestPolicy = "classic-first" | "welch-first";
export type Adjustment = "holm" | "bonferroni" | "bh";
export type PaperSize = "A4" | "Letter";

export interface OrganizationSettings {
  policy: TestPolicy;
  defaultAlpha: number;
  defaultAdjust: Adjustment;
  paperSize: PaperSize;
  updatedAt?: string;
}

export const settingsKey = ["organization", "settings"] as const;

export function getSettings(): Promise<OrganizationSettings> {
  return api.get<{ settings: OrganizationSettings }>("/organization/settings").then((r) => r.settings);
}

export const settingsQueryOptions = queryOptions({ queryKey: settingsKey, queryFn: getSettings });

export function useSettings() {
  return useQuery(settingsQueryOptions);
}
