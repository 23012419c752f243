import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { ENTITY_DRIVER } from "../db/column-types.js";
import { openDatabase } from "../db/data-source.js";
import { readStoredInvariants } from "./stored-invariants.js";

/** The crash test is only as good as its checker: it must see each kind of damage it looks for. */
// The checker reads a SQLite file with no server attached, for the SQLite kill-and-restart test.
describe.skipIf(ENTITY_DRIVER === "postgres")("readStoredInvariants", () => {
  it("reports a dataset without its audit event, a blob that does not match its size and hash, and an orphan event", async () => {
    const dbPath = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "waymark-invariants-")), "db.sqlite");
    const ds = await openDatabase(dbPath);
    await ds.query(
      `INSERT INTO users (email, display_name, role, password_hash) VALUES ('a@x.test', 'A', 'analyst', 'x')`,
    );
    await ds.query(
      `INSERT INTO studies (title, objective, outcome_name, outcome_unit, factor_name, levels, alpha, context, status, owner_id, design, plan)
       VALUES ('t', 'o', 'v', 'u', 'g', '["A","B","C"]', 0.05, 'general', 'draft', 1, '{}', '{}')`,
    );
    // Recorded as 10 bytes with the hash of empty input, but holding 5 bytes: a partial row.
    await ds.query(
      `INSERT INTO datasets (study_id, version, file_name, size_bytes, sha256, media_type, content, layout, report, observations, uploaded_by_id)
       VALUES (1, 1, 'f.csv', 10, 'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855', 'text/csv', x'0102030405', 'long', '{}', '{"groups":[]}', 1)`,
    );
    // An event for an analysis that was never stored: the pairing must fail in this direction too.
    await ds.query(
      `INSERT INTO audit_events (action, summary, "after") VALUES ('analysis.run', 'ran', '{"analysisId":7}')`,
    );
    await ds.destroy();
    const inv = readStoredInvariants(dbPath);
    expect(inv.integrity).toBe("ok");
    expect(inv.datasetIds).toEqual([1]);
    expect(inv.uploadEventDatasetIds).toEqual([]);
    expect(inv.brokenDatasets).toEqual([1]);
    expect(inv.analysisIds).toEqual([]);
    expect(inv.runEventAnalysisIds).toEqual([7]);
  });
});
