import "reflect-metadata";
import { createApp } from "./app.js";
import { loadEnv } from "./config/env.js";
import { openDatabase } from "./db/data-source.js";
import { seedDemoUsers } from "./db/seeds/demo-users.js";

async function main(): Promise<void> {
  const env = loadEnv();
  const ds = await openDatabase(env.DATABASE_PATH);
  if (env.WAYMARK_DEMO) await seedDemoUsers(ds, env.demoPassword, env.BCRYPT_COST);
  const { app, sessionStore } = createApp(ds, env);

  const server = app.listen(env.PORT, () => {
    const mode = env.WAYMARK_DEMO ? "demo mode" : env.NODE_ENV;
    console.log(`Waymark listening on http://localhost:${env.PORT} (${mode}, database ${env.DATABASE_PATH})`);
    if (env.WAYMARK_DEMO) console.log(`Demo accounts: analyst|reviewer|writer|admin@waymark.test, password ${env.demoPassword}`);
  });
  const pruner = setInterval(() => void sessionStore.prune().catch(() => undefined), 15 * 60 * 1000);
  pruner.unref();

  const shutdown = (signal: string) => {
    console.log(`${signal} received, closing`);
    server.close(() => {
      void ds.destroy().finally(() => process.exit(0));
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
