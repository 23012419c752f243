import "reflect-metadata";
import { createApp } from "./app.js";
import { startServices } from "./bootstrap.js";
import { closeTaskPool } from "./workers/task-pool.js";
import { loadEnv } from "./config/env.js";
import { openDatabase } from "./db/data-source.js";
import { seedDemoStudies } from "./db/seeds/demo-studies.js";
import { seedDemoUsers } from "./db/seeds/demo-users.js";

async function main(): Promise<void> {
  const env = loadEnv();
  const ds = await openDatabase(env.database);
  if (env.WAYMARK_DEMO) {
    await seedDemoUsers(ds, env.demoPassword, env.BCRYPT_COST);
    await seedDemoStudies(ds, env.demoPassword);
  }
  const services = await startServices(ds, env);
  const { app, sessionStore } = createApp(ds, env, services);

  const server = app.listen(env.PORT, () => {
    const mode = env.WAYMARK_DEMO ? "demo mode" : env.NODE_ENV;
    console.log(`Waymark listening on http://localhost:${env.PORT} (${mode}, database ${env.databaseLabel})`);
    if (env.WAYMARK_DEMO)
      console.log(`Demo accounts: analyst|reviewer|writer|admin@waymark.test, password ${env.demoPassword}`);
  });
  const pruner = setInterval(() => void sessionStore.prune().catch(() => undefined), 15 * 60 * 1000);
  pruner.unref();

  const shutdown = (signal: string) => {
    console.log(`${signal} received, closing`);
    server.close(() => {
      void services
        .stop()
        .then(() => closeTaskPool())
        .then(() => ds.destroy())
        .finally(() => process.exit(0));
    });
    setTimeout(() => process.exit(1), 10_000).unref();
  };
  process.on("SIGTERM", () => shutdown("SIGTERM"));
  process.on("SIGINT", () => shutdown("SIGINT"));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
