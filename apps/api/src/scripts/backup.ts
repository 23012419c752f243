import fs from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { loadEnv, type Env } from "../config/env.js";

/**
 * These scripts copy SQLite's file. A PostgreSQL database is backed up and restored with the
 * server's own tools, which work while instances keep serving.
 */
export function requireSqlite(env: Env, what: "backup" | "restore"): string {
  if (env.database.driver === "sqlite") return env.database.path;
  throw new Error(
    what === "backup"
      ? 'DATABASE_URL points at PostgreSQL; this script copies the SQLite file. Back up PostgreSQL with pg_dump, e.g. `pg_dump --format=custom --file=waymark.dump "$DATABASE_URL"`.'
      : 'DATABASE_URL points at PostgreSQL; this script restores the SQLite file. Restore PostgreSQL with pg_restore, e.g. `pg_restore --clean --if-exists --dbname="$DATABASE_URL" waymark.dump`.',
  );
}

/**
 * Writes a consistent copy of the database with SQLite's online backup API, safe while the app
 * runs (readers and the writer carry on). Usage: npm run backup [-- <target file>]
 */
export async function backupDatabase(
  source: string,
  target: string,
): Promise<{ target: string; bytes: number; integrity: string }> {
  fs.mkdirSync(path.dirname(target), { recursive: true });
  const db = new Database(source, { readonly: true, fileMustExist: true });
  try {
    await db.backup(target);
  } finally {
    db.close();
  }
  const copy = new Database(target, { readonly: true });
  const integrity = String(copy.pragma("integrity_check", { simple: true }));
  copy.close();
  return { target, bytes: fs.statSync(target).size, integrity };
}

async function main() {
  const env = loadEnv(undefined, { purpose: "script" });
  const databasePath = requireSqlite(env, "backup");
  const stamp = new Date().toISOString().replace(/[:.]/g, "-");
  const target =
    process.argv[2] ?? path.join(path.dirname(databasePath), "backups", `waymark-${stamp}.sqlite`);
  const r = await backupDatabase(databasePath, path.resolve(env.INIT_CWD ?? ".", target));
  console.log(`Backed up ${databasePath} to ${r.target} (${r.bytes} bytes, integrity ${r.integrity})`);
}

if (process.argv[1] && import.meta.url.endsWith(path.basename(process.argv[1]))) {
  main().catch((e: unknown) => {
    console.error(`backup failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  });
}
