import "reflect-metadata";
import { createApp } from "../app.js";
import { startServices } from "../bootstrap.js";
import { loadEnv } from "../config/env.js";
import { openDatabase } from "../db/data-source.js";
import { seedDemoUsers } from "../db/seeds/demo-users.js";

/** A fresh app on an in-memory database with the demo accounts, for supertest. */
export async function makeTestApp(opts: { demo?: boolean; uploadLimitMb?: number } = {}) {
  const env = loadEnv({
    NODE_ENV: "test",
    DATABASE_PATH: ":memory:",
    BCRYPT_COST: "4",
    UPLOAD_LIMIT_MB: String(opts.uploadLimitMb ?? 1),
    WAYMARK_DEMO: opts.demo === false ? "0" : "1",
  });
  const ds = await openDatabase(":memory:");
  await seedDemoUsers(ds, env.demoPassword, env.BCRYPT_COST);
  const services = await startServices(ds, env);
  const built = createApp(ds, env, services);
  return { ...built, ds, env, services };
}
