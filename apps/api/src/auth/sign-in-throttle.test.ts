import { describe, expect, it } from "vitest";
import { anon } from "../test-support/agents.js";
import { makeTestApp } from "../test-support/test-app.js";

describe("sign-in throttling (express-rate-limit)", () => {
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
