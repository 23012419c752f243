import { createHash } from "node:crypto";
import Database from "better-sqlite3";

/**
 * What a crash must never leave behind, read straight from a SQLite database file (read-only,
 * with no server attached; the kill-and-restart test is about SQLite's file): SQLite's own integrity and foreign-key checks, every dataset whole (its
 * blob matches its recorded size and SHA-256, its values parse) and every dataset and analysis
 * paired one-to-one with the audit event written in the same transaction.
 */
export function readStoredInvariants(databasePath: string) {
  const db = new Database(databasePath, { readonly: true, fileMustExist: true });
  try {
    const integrity = db.pragma("integrity_check", { simple: true }) as string;
    const foreignKeyViolations = (db.pragma("foreign_key_check") as unknown[]).length;

    const datasets = db
      .prepare(`SELECT id, size_bytes, sha256, content, observations FROM datasets ORDER BY id`)
      .all() as { id: number; size_bytes: number; sha256: string; content: Buffer; observations: string }[];
    const brokenDatasets = datasets
      .filter((d) => {
        if (d.content.length !== d.size_bytes) return true;
        if (createHash("sha256").update(d.content).digest("hex") !== d.sha256) return true;
        try {
          return !Array.isArray((JSON.parse(d.observations) as { groups?: unknown }).groups);
        } catch {
          return true;
        }
      })
      .map((d) => d.id);

    // The audit trail's JSON is read here rather than with SQLite's json functions.
    const eventIds = (action: string, key: string) =>
      (
        db.prepare(`SELECT "after" FROM audit_events WHERE action = ?`).pluck().all(action) as (
          string | null
        )[]
      )
        .map((after) => {
          const value = after === null ? null : (JSON.parse(after) as Record<string, unknown>)[key];
          return typeof value === "number" ? value : null;
        })
        .sort((a, b) => (a ?? 0) - (b ?? 0));
    const analyses = db.prepare(`SELECT id, result FROM analyses ORDER BY id`).all() as {
      id: number;
      result: string;
    }[];
    const unreadableAnalyses = analyses
      .filter((a) => {
        try {
          return typeof JSON.parse(a.result) !== "object";
        } catch {
          return true;
        }
      })
      .map((a) => a.id);

    return {
      integrity,
      foreignKeyViolations,
      datasetIds: datasets.map((d) => d.id),
      uploadEventDatasetIds: eventIds("dataset.uploaded", "datasetId"),
      brokenDatasets,
      analysisIds: analyses.map((a) => a.id),
      runEventAnalysisIds: eventIds("analysis.run", "analysisId"),
      unreadableAnalyses,
    };
  } finally {
    db.close();
  }
}
