import { z } from "zod";
import { alpha, timestamp } from "./common.js";
import { adjustment, paperSize, policy } from "./enums.js";

export const settingsBody = z
  .object({ policy, defaultAlpha: alpha, defaultAdjust: adjustment, paperSize })
  .partial()
  .strict();
export type SettingsBody = z.infer<typeof settingsBody>;

export const settingsDto = z.object({
  policy,
  defaultAlpha: z.number(),
  defaultAdjust: adjustment,
  paperSize,
  updatedAt: timestamp,
});
export type SettingsDto = z.infer<typeof settingsDto>;

export const settingsResponse = z.object({ settings: settingsDto });
