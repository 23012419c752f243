import { describe, expect, it } from "vitest";
import { createApp } from "../app.js";
import { startServices } from "../bootstrap.js";
import { loadEnv } from "../config/env.js";
import { seedDemoUsers } from "../db/seeds/demo-users.js";
import { anon } from "../test-support/agents.js";
import { openSharedDatabase } from "../test-support/shared-database.js";
import { makeTestApp } from "../test-support/test-app.js";

describe("sign-in throttling (express-rate-limit, counters in the database)", () => {
  it("refuses an account after 10 failed sign-ins in 15 minutes, says when to retry, and audits every attempt", async () => {
    const t = await makeTestApp();
    const client = await anon(t.app);
    for (let i = 0; i < 10; i++)
      await client
        .post("/api/auth/login")
        .send({ email: "reviewer@waymark.test", password: `wrong-${i}` })
        .expect(401);
    const blocked = await client
      .post("/api/auth/login")
      .send({ email: "reviewer@waymark.test", password: t.env.demoPassword })
      .expect(429);
    expect(blocked.body.error.message).toMatch(
      /Too many failed sign-ins for this account\. Try again in 1[45] minutes\./,
    );
    // Other accounts are not affected by one account's lock-out.
    await client
      .post("/api/auth/login")
      .send({ email: "writer@waymark.test", password: t.env.demoPassword })
      .expect(200);
    const failed = await t.ds.query(
      `SELECT count(*) AS n FROM audit_events WHERE action = 'auth.sign-in-failed' AND actor_email = 'reviewer@waymark.test'`,
    );
    expect(Number(failed[0].n)).toBe(10);
    await t.services.stop();
  });
});

describe("sign-in throttling across API instances", () => {
  it("counts failed sign-ins on two apps sharing one database together", async () => {
    const shared = await openSharedDatabase();
    const env = loadEnv({ NODE_ENV: "test", BCRYPT_COST: "4", WAYMARK_DEMO: "1" });
    const sources = [await shared.connect(), await shared.connect()];
    await seedDemoUsers(sources[0]!, env.demoPassword, env.BCRYPT_COST);
    const instances = await Promise.all(
      sources.map(async (ds) => {
        const services = await startServices(ds, env);
        return { ds, services, client: await anon(createApp(ds, env, services).app) };
      }),
    );
    try {
      // Ten failures, alternating between the instances: each saw only five.
      for (let i = 0; i < 10; i++)
        await instances[i % 2]!.client.post("/api/auth/login")
          .send({ email: "analyst@waymark.test", password: `wrong-${i}` })
          .expect(401);
      for (const { client } of instances)
        await client
          .post("/api/auth/login")
          .send({ email: "analyst@waymark.test", password: env.demoPassword })
          .expect(429);
      // A success on either instance takes its own hit back (skipSuccessfulRequests) and counts nothing.
      await instances[0]!.client
        .post("/api/auth/login")
        .send({ email: "writer@waymark.test", password: env.demoPassword })
        .expect(200);
      // The hit is taken back when the response has finished, just after the client has it.
      const counters = async () =>
        (
          (await sources[1]!.query(
            `SELECT "key", "hits" FROM "sign_in_throttle" WHERE "key" LIKE 'account:%' ORDER BY "key"`,
          )) as { key: string; hits: number | string }[]
        ).map((r) => ({ key: r.key, hits: Number(r.hits) }));
      let rows = await counters();
      for (let i = 0; i < 100 && rows.some((r) => r.key.startsWith("account:writer") && r.hits > 0); i++) {
        await new Promise((r) => setTimeout(r, 20));
        rows = await counters();
      }
      expect(rows).toEqual([
        { key: "account:analyst@waymark.test", hits: 12 },
        { key: "account:writer@waymark.test", hits: 0 },
      ]);
    } finally {
      for (const { services } of instances) await services.stop();
      await shared.close();
    }
  });
});
