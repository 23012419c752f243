import "reflect-metadata";
import { createApp } from "../app.js";
import { startServices } from "../bootstrap.js";
import { loadEnv } from "../config/env.js";
import { seedDemoUsers } from "../db/seeds/demo-users.js";
import { closeTestDatabase, openTestDatabase } from "./test-database.js";

const open: { stop: () => Promise<void> }[] = [];

/**
 * A fresh app on a fresh database with the demo accounts, for supertest: SQLite in memory, or a
 * new PostgreSQL database when the suite runs with WAYMARK_TEST_DB=postgres. Closed after the
 * test file (close-apps.ts).
 */
export async function makeTestApp(opts: { demo?: boolean; uploadLimitMb?: number } = {}) {
  const { ds, url } = await openTestDatabase();
  const env = loadEnv({
    NODE_ENV: "test",
    DATABASE_PATH: ":memory:",
    ...(url ? { DATABASE_URL: url } : {}),
    BCRYPT_COST: "4",
    UPLOAD_LIMIT_MB: String(opts.uploadLimitMb ?? 1),
    WAYMARK_DEMO: opts.demo === false ? "0" : "1",
  });
  await seedDemoUsers(ds, env.demoPassword, env.BCRYPT_COST);
  const services = await startServices(ds, env);
  const built = createApp(ds, env, services);
  open.push({
    stop: async () => {
      built.analysisRuns.stopSweeping();
      await services.stop();
      // A send already under way finishes before its database goes (kick() joins a run in flight).
      await services.mail.kick().catch(() => undefined);
      await closeTestDatabase(ds);
    },
  });
  return { ...built, ds, env, services };
}

/** Closes every app made so far (their mail dispatchers, fake mail servers and databases). */
export async function closeTestApps(): Promise<void> {
  for (const app of open.splice(0)) await app.stop();
}
