import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { settingsKey, type OrganizationSettings } from "./get-settings";

export type SettingsInput = Omit<OrganizationSettings, "updatedAt">;

export function updateSettings(input: SettingsInput): Promise<OrganizationSettings> {
  return api
    .put<{ settings: OrganizationSettings }>("/organization/settings", { ...input })
    .then((r) => r.settings);
}

export function useUpdateSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    onSuccess: (settings) => qc.setQueryData(settingsKey, settings),
  });
}
