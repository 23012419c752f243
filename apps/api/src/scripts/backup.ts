import fs from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { loadEnv } from "../config/env.js";

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
  const stamp = new Date().toISOString().replace(/[:.]/g, "-");
  const target =
    process.argv[2] ?? path.join(path.dirname(env.DATABASE_PATH), "backups", `waymark-${stamp}.sqlite`);
  const r = await backupDatabase(env.DATABASE_PATH, path.resolve(env.INIT_CWD ?? ".", target));
  console.log(`Backed up ${env.DATABASE_PATH} to ${r.target} (${r.bytes} bytes, integrity ${r.integrity})`);
}

if (process.argv[1] && import.meta.url.endsWith(path.basename(process.argv[1]))) {
  main().catch((e: unknown) => {
    console.error(`backup failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  });
}
