import fs from "node:fs";
import path from "node:path";
import { DataSource } from "typeorm";
import { entities } from "./entities.js";
import { migrations } from "./migrations/index.js";

/**
 * The SQLite data source. WAL lets readers continue during a write; the busy timeout makes a
 * second writer wait instead of failing at once. ":memory:" is accepted for tests.
 */
export function createDataSource(databasePath: string): DataSource {
  if (databasePath !== ":memory:") fs.mkdirSync(path.dirname(databasePath), { recursive: true });
  return new DataSource({
    type: "better-sqlite3",
    database: databasePath,
    entities,
    migrations,
    migrationsRun: false,
    synchronize: false,
    enableWAL: databasePath !== ":memory:",
    timeout: 5000,
    prepareDatabase: (db: { pragma: (s: string) => unknown }) => {
      db.pragma("foreign_keys = ON");
      db.pragma("busy_timeout = 5000");
    },
  });
}

/** Opens the database and brings its schema up to date. */
export async function openDatabase(databasePath: string): Promise<DataSource> {
  const ds = createDataSource(databasePath);
  await ds.initialize();
  await ds.runMigrations({ transaction: "each" });
  return ds;
}
