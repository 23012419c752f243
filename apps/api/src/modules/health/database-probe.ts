import type { DataSource } from "typeorm";
import type { PostgresDriver } from "typeorm/driver/postgres/PostgresDriver.js";

/** A database that has not answered in this long counts as unreachable (common practice: well under a load balancer's check interval). */
export const DATABASE_TIMEOUT_MS = 2000;

/** Whether the database answers `SELECT 1` within the timeout; `close` ends what the probe holds. */
export interface DatabaseProbe {
  answers(): Promise<boolean>;
  close(): Promise<void>;
}

/** The part of pg's Client the probe uses (pg ships no types; TypeORM has loaded the module). */
interface PgClient {
  connect(): Promise<unknown>;
  query(sql: string): Promise<unknown>;
  end(): Promise<void>;
  on(event: "error", listener: (e: Error) => void): unknown;
}

async function withinTimeout(work: Promise<unknown>): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  try {
    return await Promise.race([
      work.then(() => true),
      new Promise<boolean>((resolve) => (timer = setTimeout(() => resolve(false), DATABASE_TIMEOUT_MS))),
    ]);
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}

/**
 * SQLite has no pool to wait for: the probe asks the data source itself. On PostgreSQL it asks
 * through one connection of its own, outside the pool, so a saturated pool (every connection busy
 * with requests) does not read as an unreachable database: were readiness to queue behind the
 * requests, every instance under the same load would report unready at once and leave the load
 * balancer no server. The connection opens on the first probe, is dropped after any error or
 * timeout (the next probe reconnects), and is closed at shutdown. Probes that arrive while one is
 * under way share its answer, so the probe never queues more than one query.
 */
export function databaseProbe(ds: DataSource): DatabaseProbe {
  const o = ds.options;
  if (o.type !== "postgres")
    return { answers: () => withinTimeout(ds.query("SELECT 1")), close: () => Promise.resolve() };

  let client: PgClient | null = null;
  let connecting: Promise<unknown> | null = null;
  let inFlight: Promise<boolean> | null = null;

  const drop = (c: PgClient | null) => {
    if (c && c === client) {
      client = null;
      connecting = null;
    }
    // A broken or hung connection may never finish ending; nothing waits for it.
    void c?.end().catch(() => undefined);
  };

  const open = (): { c: PgClient; ready: Promise<unknown> } => {
    if (client && connecting) return { c: client, ready: connecting };
    const { Client } = (ds.driver as PostgresDriver).postgres as { Client: new (config: object) => PgClient };
    const c = new Client({
      connectionString: o.url,
      host: o.host,
      port: o.port,
      user: o.username,
      password: o.password,
      database: o.database,
      ssl: o.ssl,
      application_name: "waymark-api-readiness",
      connectionTimeoutMillis: DATABASE_TIMEOUT_MS,
    });
    // A connection the server ends (restart, terminate) reports here; unheard, it would crash the process.
    c.on("error", () => drop(c));
    client = c;
    connecting = c.connect();
    return { c, ready: connecting };
  };

  const check = async (): Promise<boolean> => {
    // A closed data source (the instance is stopping) is not ready, whatever the database says.
    if (!ds.isInitialized) return false;
    const { c, ready } = open();
    const ok = await withinTimeout(ready.then(() => c.query("SELECT 1")));
    if (!ok) drop(c);
    return ok;
  };

  return {
    answers: () => (inFlight ??= check().finally(() => (inFlight = null))),
    close: async () => {
      const c = client;
      client = null;
      connecting = null;
      await c?.end().catch(() => undefined);
    },
  };
}
