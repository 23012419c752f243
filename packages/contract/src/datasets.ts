import { z } from "zod";
import { person, timestamp } from "./common.js";
import { exclusionReason, layout } from "./enums.js";
import { LIMITS } from "./limits.js";

/** Multipart fields that come with an upload; text fields, so empty strings mean "not given". */
export const columnChoiceBody = z
  .object({
    layout: layout.default("long"),
    groupColumn: z.string().max(LIMITS.columnName).optional(),
    outcomeColumn: z.string().max(LIMITS.columnName).optional(),
  })
  .refine((c) => c.layout === "wide" || (!!c.groupColumn && !!c.outcomeColumn), {
    message: "Name the group column and the outcome column, or choose the wide layout",
    path: ["groupColumn"],
  });
export type ColumnChoiceBody = z.infer<typeof columnChoiceBody>;

/** What an upload's rows gave: everything read, excluded (and why, by row) and how groups match the levels. */
export const validationReport = z.object({
  rowsRead: z.number(),
  rowsUsed: z.number(),
  excluded: z.array(
    z.object({ row: z.number(), reason: exclusionReason, value: z.string(), column: z.string() }),
  ),
  /** How many exclusions there were in all; the list above is capped for very large files. */
  excludedCount: z.number(),
  groupsFound: z.array(z.object({ name: z.string(), n: z.number() })),
  unknownLevels: z.array(z.string()),
  missingLevels: z.array(z.string()),
  messages: z.array(z.string()),
  /** True when the data can be analysed: at least two groups with at least two values each. */
  usable: z.boolean(),
});
export type ValidationReport = z.infer<typeof validationReport>;

export const datasetDto = z.object({
  id: z.number(),
  studyId: z.number(),
  version: z.number(),
  fileName: z.string(),
  sizeBytes: z.number(),
  sha256: z.string(),
  mediaType: z.string(),
  uploadedAt: timestamp,
  uploadedBy: person.nullable(),
  layout,
  groupColumn: z.string().nullable(),
  outcomeColumn: z.string().nullable(),
  /** Reviewers check that data arrived only after the analysis was pre-specified. */
  afterPlanLock: z.boolean(),
  report: validationReport,
});
export type DatasetDto = z.infer<typeof datasetDto>;

export const datasetResponse = z.object({ dataset: datasetDto });
/** In the versions list: `active` marks the version analyses and submissions use. */
export const datasetListItem = datasetDto.extend({ active: z.boolean() });
export type DatasetListItem = z.infer<typeof datasetListItem>;
export const datasetListResponse = z.object({ datasets: z.array(datasetListItem) });

/**
 * A 422 `data_does_not_match_plan` carries this in `error.details`: what the file lacks, and the
 * near-miss names the analyst can confirm by sending `levelMap` with the upload again.
 */
export const planMismatchDetails = z.object({
  missing: z.array(z.string()),
  tooSmall: z.array(z.object({ level: z.string(), n: z.number() })),
  unplanned: z.array(z.string()),
  suggestions: z.array(z.object({ found: z.string(), planned: z.string() })),
});
export type PlanMismatchDetails = z.infer<typeof planMismatchDetails>;

export const datasetPreview = z.object({
  columns: z.array(z.string()),
  rows: z.array(z.array(z.string())),
  rowCount: z.number(),
  format: z.enum(["csv", "xlsx"]),
  guess: z.object({
    layout,
    groupColumn: z.string().nullable().optional(),
    outcomeColumn: z.string().nullable().optional(),
  }),
});
export type DatasetPreview = z.infer<typeof datasetPreview>;
