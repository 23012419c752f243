import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import Database from "better-sqlite3";
import { describe, expect, it } from "vitest";
import { openDatabase } from "../db/data-source.js";
import { loadEnv } from "../config/env.js";
import { ENTITY_DRIVER } from "../db/column-types.js";
import { backupDatabase, requireSqlite } from "./backup.js";
import { restoreDatabase } from "./restore.js";

describe("backup and restore refuse a PostgreSQL database, naming pg_dump and pg_restore", () => {
  it("refuses with the PostgreSQL tools named", () => {
    const env = loadEnv(
      { DATABASE_URL: "postgres://waymark@db.example:5432/waymark" },
      { purpose: "script" },
    );
    expect(() => requireSqlite(env, "backup")).toThrow(/pg_dump/);
    expect(() => requireSqlite(env, "restore")).toThrow(/pg_restore/);
    expect(requireSqlite(loadEnv({ DATABASE_PATH: "/tmp/w.sqlite" }, { purpose: "script" }), "backup")).toBe(
      "/tmp/w.sqlite",
    );
  });
});

// These copy SQLite's file; PostgreSQL is backed up with pg_dump, not by this code.
describe.skipIf(ENTITY_DRIVER === "postgres")("backup and restore", () => {
  it("round-trips a live database through SQLite's online backup", async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "waymark-backup-"));
    const live = path.join(dir, "live.sqlite");
    const ds = await openDatabase(live);
    await ds.query(`INSERT INTO audit_events (action, summary) VALUES ('study.created', 'before backup')`);
    const r = await backupDatabase(live, path.join(dir, "copy.sqlite"));
    expect(r.integrity).toBe("ok");
    // Written after the backup, so it must be gone after the restore.
    await ds.query(`INSERT INTO audit_events (action, summary) VALUES ('study.created', 'after backup')`);
    await ds.destroy();
    restoreDatabase(r.target, live);
    const db = new Database(live, { readonly: true });
    const rows = db.prepare(`SELECT summary FROM audit_events ORDER BY id`).all() as { summary: string }[];
    expect(rows.map((x) => x.summary)).toEqual(["before backup"]);
    expect(db.pragma("integrity_check", { simple: true })).toBe("ok");
    db.close();
  });

  it("refuses to restore a file that is not a sound database", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "waymark-backup-"));
    const junk = path.join(dir, "junk.sqlite");
    fs.writeFileSync(junk, "not a database at all");
    expect(() => restoreDatabase(junk, path.join(dir, "live.sqlite"))).toThrow();
  });
});
