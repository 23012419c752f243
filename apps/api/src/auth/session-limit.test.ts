import { describe, expect, it } from "vitest";
import { signedIn } from "../test-support/agents.js";
import { makeTestApp } from "../test-support/test-app.js";
import { sql } from "../test-support/sql.js";

describe("session limits", () => {
  it("signs a session out 12 hours after sign-in however active it was (absolute limit)", async () => {
    const t = await makeTestApp();
    const agent = await signedIn(t.app, "analyst", t.env.demoPassword);
    await agent.get("/api/auth/me").expect(200);
    // Age the stored session's sign-in time by 12 hours and a minute.
    const rows = (await t.ds.query(`SELECT sid, data FROM sessions WHERE user_id IS NOT NULL`)) as {
      sid: string;
      data: string;
    }[];
    for (const r of rows) {
      const data = JSON.parse(r.data) as { startedAt: number };
      data.startedAt -= (12 * 60 + 1) * 60_000;
      await sql(t.ds, `UPDATE sessions SET data = :data WHERE sid = :sid`, {
        data: JSON.stringify(data),
        sid: r.sid,
      });
    }
    await agent.get("/api/auth/me").expect(401);
    await t.services.stop();
  });

  it("gives the cookie the idle limit as its lifetime (SESSION_IDLE_MINUTES, rolling)", async () => {
    const t = await makeTestApp();
    const agent = await signedIn(t.app, "writer", t.env.demoPassword);
    const res = await agent.get("/api/auth/me").expect(200);
    const expires = /Expires=([^;]+)/.exec(String(res.headers["set-cookie"]))?.[1];
    const minutes = (Date.parse(expires!) - Date.now()) / 60_000;
    expect(minutes).toBeGreaterThan(t.env.SESSION_IDLE_MINUTES - 2);
    expect(minutes).toBeLessThanOrEqual(t.env.SESSION_IDLE_MINUTES);
    await t.services.stop();
  });
});
