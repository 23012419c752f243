import fs from "node:fs";
import path from "node:path";
import { DataSource } from "typeorm";
import type { DatabaseLocation } from "../config/env.js";
import { ENTITY_DRIVER } from "./column-types.js";
import { isPostgres } from "./driver.js";
import { entities } from "./entities.js";
import { migrations } from "./migrations/index.js";

/** A SQLite file path (":memory:" for tests) or a full location from `loadEnv().database`. */
export type DatabaseTarget = string | DatabaseLocation;

function locate(target: DatabaseTarget): DatabaseLocation {
  if (typeof target !== "string") return target;
  if (/^postgres(ql)?:\/\//.test(target))
    return { driver: "postgres", url: target, poolSize: 10, statementTimeoutMs: 0 };
  return { driver: "sqlite", path: target };
}

/**
 * The data source for SQLite or PostgreSQL. On SQLite, WAL lets readers continue during a write
 * and the busy timeout makes a second writer wait instead of failing at once. On PostgreSQL, a
 * pool of connections (DATABASE_POOL_SIZE) and an optional statement timeout.
 */
export function createDataSource(target: DatabaseTarget): DataSource {
  const where = locate(target);
  if (where.driver !== ENTITY_DRIVER)
    throw new Error(
      `This process defined its tables for ${ENTITY_DRIVER === "postgres" ? "PostgreSQL" : "SQLite"} ` +
        `but was asked to open ${where.driver === "postgres" ? "a PostgreSQL database" : "a SQLite file"}: ` +
        `set DATABASE_URL before the process starts to use PostgreSQL, and leave it unset for SQLite.`,
    );
  if (where.driver === "postgres") {
    return new DataSource({
      type: "postgres",
      url: where.url,
      entities,
      migrations,
      migrationsRun: false,
      synchronize: false,
      poolSize: where.poolSize,
      extra: {
        // A statement past the limit is cancelled by the server rather than holding a connection.
        ...(where.statementTimeoutMs > 0 ? { statement_timeout: where.statementTimeoutMs } : {}),
        application_name: "waymark-api",
      },
    });
  }
  const databasePath = where.path;
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

/** Any fixed number: the key of the advisory lock that lets one instance at a time migrate. */
const MIGRATION_LOCK = 7_412_650;

/**
 * Opens the database and brings its schema up to date. On PostgreSQL several instances may start
 * at once; an advisory lock makes the others wait and then find nothing left to run.
 */
export async function openDatabase(target: DatabaseTarget): Promise<DataSource> {
  const ds = createDataSource(target);
  await ds.initialize();
  if (!isPostgres(ds)) {
    await ds.runMigrations({ transaction: "each" });
    return ds;
  }
  const lock = ds.createQueryRunner();
  try {
    await lock.query(`SELECT pg_advisory_lock($1)`, [MIGRATION_LOCK]);
    await ds.runMigrations({ transaction: "each" });
  } finally {
    await lock.query(`SELECT pg_advisory_unlock($1)`, [MIGRATION_LOCK]).catch(() => undefined);
    await lock.release();
  }
  return ds;
}
