import { z } from "zod";
import { studyStatus } from "./enums.js";
import { person, timestamp } from "./common.js";

/**
 * The report as blocks: one text source for the HTML preview in the web app and the DOCX, so
 * the two cannot drift apart.
 */
export const run = z.object({
  text: z.string(),
  italic: z.boolean().optional(),
  bold: z.boolean().optional(),
});
export type Run = z.infer<typeof run>;

export const REPORT_SECTIONS = ["methods", "results", "sign-off"] as const;
export const REPORT_FIGURES = ["groups", "intervals"] as const;

export const block = z.discriminatedUnion("type", [
  z.object({
    type: z.literal("heading"),
    level: z.union([z.literal(1), z.literal(2), z.literal(3)]),
    text: z.string(),
  }),
  z.object({ type: z.literal("paragraph"), runs: z.array(run), section: z.enum(REPORT_SECTIONS).optional() }),
  z.object({
    type: z.literal("table"),
    caption: z.string(),
    header: z.array(z.string()),
    rows: z.array(z.array(z.string())),
  }),
  z.object({
    type: z.literal("figure"),
    caption: z.string(),
    figure: z.enum(REPORT_FIGURES),
    /** The figure as a data: URL (PNG), in the preview. */
    image: z.string().optional(),
  }),
  z.object({ type: z.literal("caution"), text: z.string() }),
  z.object({ type: z.literal("references"), items: z.array(z.string()) }),
]);
export type Block = z.infer<typeof block>;
export type ReportSection = (typeof REPORT_SECTIONS)[number];

export const reportPreview = z.object({
  report: z.object({ blocks: z.array(block) }),
  approved: z.boolean(),
  draft: z.boolean(),
});
export type ReportPreview = z.infer<typeof reportPreview>;

export const reportExport = z.object({
  id: z.number(),
  at: timestamp,
  actorEmail: z.string().nullable(),
  draft: z.boolean(),
});
export type ReportExport = z.infer<typeof reportExport>;

/** A study as listed for report readers. */
export const reportStudy = z.object({
  id: z.number(),
  title: z.string(),
  status: studyStatus,
  owner: person.nullable(),
  outcomeName: z.string(),
  levels: z.array(z.string()),
  updatedAt: timestamp,
});
export type ReportStudy = z.infer<typeof reportStudy>;
