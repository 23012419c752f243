import { analyze, StatsInputError, type AnalyzeInput } from "@waymark/stats";
import { extractGroups, type ColumnChoice } from "../modules/datasets/extract-groups.js";
import { parseUpload } from "../modules/datasets/parse-upload.js";
import { HttpError } from "../http/errors.js";

/**
 * The CPU-heavy steps, written as plain functions of plain data so they can run in a worker
 * thread. Errors cross the thread boundary as { error } values, because class identity does not.
 */
export type TaskError = { error: { status: number; code: string; message: string; details?: unknown } };

function asTaskError(e: unknown): TaskError {
  if (e instanceof HttpError)
    return { error: { status: e.status, code: e.code, message: e.message, details: e.details } };
  if (e instanceof StatsInputError)
    return { error: { status: 422, code: "cannot_analyse", message: e.message } };
  throw e;
}

/** A Buffer over the bytes the worker received, without copying them again (uploads run to 50 MB). */
function asBuffer(bytes: Uint8Array): Buffer {
  return Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

export function analyzeTask(input: AnalyzeInput) {
  try {
    return { result: analyze(input) };
  } catch (e) {
    return asTaskError(e);
  }
}

/** Reads a file's header and first rows, for choosing columns. */
export async function previewTask(input: { fileName: string; bytes: Uint8Array }) {
  try {
    const table = await parseUpload(input.fileName, asBuffer(input.bytes));
    return {
      columns: table.columns,
      format: table.format,
      rowCount: table.rows.length,
      head: table.rows.slice(0, 500),
    };
  } catch (e) {
    return asTaskError(e);
  }
}

/** Reads a whole file into groups under the chosen layout, with the validation report. */
export async function extractTask(input: {
  fileName: string;
  bytes: Uint8Array;
  choice: ColumnChoice;
  levels: string[];
}) {
  try {
    const table = await parseUpload(input.fileName, asBuffer(input.bytes));
    return { ...extractGroups(table, input.choice, input.levels), format: table.format };
  } catch (e) {
    return asTaskError(e);
  }
}
