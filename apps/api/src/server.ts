import "reflect-metadata";
import http from "node:http";
import { createApp } from "./app.js";
import { pruneSignInThrottle } from "./auth/sign-in-throttle-store.js";
import { startServices } from "./bootstrap.js";
import { closeTaskPool } from "./workers/task-pool.js";
import { loadEnv } from "./config/env.js";
import { openDatabase } from "./db/data-source.js";
import { seedDemoStudies } from "./db/seeds/demo-studies.js";
import { seedDemoUsers } from "./db/seeds/demo-users.js";
import { isDraining, onShutdown, runShutdownHooks, startDraining } from "./lifecycle/shutdown.js";

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function main(): Promise<void> {
  const env = loadEnv();
  const ds = await openDatabase(env.database);
  if (env.WAYMARK_DEMO) {
    await seedDemoUsers(ds, env.demoPassword, env.BCRYPT_COST);
    await seedDemoStudies(ds, env.demoPassword);
  }
  const services = await startServices(ds, env);
  const { app, sessionStore, analysisRuns } = createApp(ds, env, services);
  // Runs this instance still holds when requests have ended are given back for another instance.
  onShutdown("Giving back analysis runs", () => analysisRuns.stop().then(() => undefined));

  // Responses in flight when draining begins, so they can be told to close their connection.
  const inFlight = new Set<http.ServerResponse>();
  const server = http.createServer((req, res) => {
    inFlight.add(res);
    res.on("close", () => inFlight.delete(res));
    // While draining, no connection is kept alive for another request.
    if (isDraining()) res.setHeader("Connection", "close");
    app(req, res);
  });
  server.once("error", (e) => {
    console.error(`Cannot listen on port ${env.PORT}: ${e.message}`);
    process.exit(1);
  });
  server.listen(env.PORT, () => {
    const mode = env.WAYMARK_DEMO ? "demo mode" : env.NODE_ENV;
    console.log(`Waymark listening on http://localhost:${env.PORT} (${mode}, database ${env.databaseLabel})`);
    if (env.WAYMARK_DEMO)
      console.log(`Demo accounts: analyst|reviewer|writer|admin@waymark.test, password ${env.demoPassword}`);
  });
  const pruner = setInterval(
    () => {
      void sessionStore.prune().catch(() => undefined);
      void pruneSignInThrottle(ds).catch(() => undefined);
    },
    15 * 60 * 1000,
  );
  pruner.unref();

  /**
   * Graceful shutdown: readiness answers 503 at once; after SHUTDOWN_DELAY_SECONDS (time for a
   * load balancer to notice) the listener closes, so new connections are refused; requests in
   * flight get up to SHUTDOWN_GRACE_SECONDS to finish, then their connections are cut. Then the
   * mail dispatcher stops and gives back its unsent claims, the shutdown hooks give back other
   * claimed work, and the worker pools and the database close.
   */
  const shutdown = async (signal: string) => {
    const delayMs = env.SHUTDOWN_DELAY_SECONDS * 1000;
    const graceMs = env.SHUTDOWN_GRACE_SECONDS * 1000;
    console.log(`${signal} received: draining (readiness now 503)`);
    startDraining();
    const deadline = setTimeout(
      () => {
        console.error("Shutdown did not finish in time; exiting");
        process.exit(1);
      },
      delayMs + graceMs + 30_000,
    );
    deadline.unref();

    for (const res of inFlight) if (!res.headersSent) res.setHeader("Connection", "close");
    if (delayMs > 0) await sleep(delayMs);

    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    // Idle kept-alive connections close now; busy ones as soon as their response is done.
    server.closeIdleConnections();
    const sweep = setInterval(() => server.closeIdleConnections(), 100);
    const finished = await Promise.race([closed.then(() => true), sleep(graceMs).then(() => false)]);
    clearInterval(sweep);
    if (!finished) {
      console.error(
        `${inFlight.size} request(s) still running after ${env.SHUTDOWN_GRACE_SECONDS} s; closing them`,
      );
      server.closeAllConnections();
    }
    console.log("No longer serving; giving back claimed work");

    clearInterval(pruner);
    const step = (what: string, p: Promise<unknown>) =>
      p.catch((e: unknown) => console.error(`${what} failed: ${e instanceof Error ? e.message : String(e)}`));
    await step("Stopping the mail dispatcher", services.stop());
    await runShutdownHooks();
    await step("Closing the worker pools", closeTaskPool());
    await step("Closing the database", ds.destroy());
    console.log("Shutdown complete");
    process.exit(0);
  };
  let stopping = false;
  for (const signal of ["SIGTERM", "SIGINT"] as const) {
    process.on(signal, () => {
      if (stopping) {
        // A second Ctrl-C means "now".
        if (signal === "SIGINT") process.exit(1);
        return;
      }
      stopping = true;
      void shutdown(signal);
    });
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
