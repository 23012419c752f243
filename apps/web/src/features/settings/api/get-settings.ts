import { queryOptions, useQuery } from "@tanstack/react-query";
import type { SettingsDto } from "@waymark/contract";
import { api } from "@/lib/api-client";

export type OrganizationSettings = SettingsDto;

export const settingsKey = ["organization", "settings"] as const;

export function getSettings(): Promise<OrganizationSettings> {
  return api.get<{ settings: OrganizationSettings }>("/organization/settings").then((r) => r.settings);
}

export const settingsQueryOptions = queryOptions({ queryKey: settingsKey, queryFn: getSettings });

export function useSettings() {
  return useQuery(settingsQueryOptions);
}
