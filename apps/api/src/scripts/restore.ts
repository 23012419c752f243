import fs from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { loadEnv } from "../config/env.js";
import { requireSqlite } from "./backup.js";

/**
 * Restores a backup over the database file. Run it with the app stopped. The backup is checked
 * with PRAGMA integrity_check first; the current file is kept beside it as *.before-restore.
 * Usage: npm run restore -- <backup file>
 */
export function restoreDatabase(backup: string, target: string): { kept: string | null } {
  const check = new Database(backup, { readonly: true, fileMustExist: true });
  const integrity = String(check.pragma("integrity_check", { simple: true }));
  check.close();
  if (integrity !== "ok") throw new Error(`the backup ${backup} fails the integrity check: ${integrity}`);
  let kept: string | null = null;
  if (fs.existsSync(target)) {
    kept = `${target}.before-restore`;
    fs.copyFileSync(target, kept);
  }
  // The WAL and shared-memory files belong to the old database; a stale WAL would be replayed over the restore.
  for (const suffix of ["-wal", "-shm"]) fs.rmSync(target + suffix, { force: true });
  fs.mkdirSync(path.dirname(target), { recursive: true });
  fs.copyFileSync(backup, target);
  return { kept };
}

function main() {
  const env = loadEnv(undefined, { purpose: "script" });
  const databasePath = requireSqlite(env, "restore");
  const file = process.argv[2];
  if (!file) {
    console.error("usage: npm run restore -- <backup file>");
    process.exit(2);
  }
  const { kept } = restoreDatabase(path.resolve(env.INIT_CWD ?? ".", file), databasePath);
  console.log(`Restored ${file} to ${databasePath}${kept ? ` (previous file kept as ${kept})` : ""}`);
}

if (process.argv[1] && import.meta.url.endsWith(path.basename(process.argv[1]))) {
  try {
    main();
  } catch (e) {
    console.error(`restore failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  }
}
