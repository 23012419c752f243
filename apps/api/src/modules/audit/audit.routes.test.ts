import { beforeAll, describe, expect, it } from "vitest";
import { anon, signedIn } from "../../test-support/agents.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { neutralizeCell } from "./audit-csv.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let admin: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  admin = await signedIn(t.app, "admin", t.env.demoPassword);
});

describe("audit trail", () => {
  it("records sign-ins and failed sign-ins, filterable by action and actor", async () => {
    await (
      await anon(t.app)
    )
      .post("/api/auth/login")
      .send({ email: "writer@waymark.test", password: "nope" })
      .expect(401);
    const failed = await admin.get("/api/audit").query({ action: "auth.sign-in-failed" }).expect(200);
    expect(failed.body.events[0]).toMatchObject({
      action: "auth.sign-in-failed",
      actorEmail: "writer@waymark.test",
    });
    const mine = await admin.get("/api/audit").query({ actor: "admin@" }).expect(200);
    expect(mine.body.events.every((e: { actorEmail: string }) => e.actorEmail === "admin@waymark.test")).toBe(
      true,
    );
  });

  it("is append-only: the database refuses updates and deletes, and no route changes it", async () => {
    await expect(t.ds.query(`UPDATE audit_events SET summary = 'x'`)).rejects.toThrow(/append-only/);
    await expect(t.ds.query(`DELETE FROM audit_events`)).rejects.toThrow(/append-only/);
    const writes = t.routes.filter((r) => r.path.startsWith("/api/audit") && r.method !== "get");
    expect(writes).toEqual([]);
  });

  it("exports CSV with formula-like cells neutralized (OWASP CSV injection guidance)", async () => {
    expect(["=1+1", "+A1", "-2", "@SUM(A1)", "plain"].map(neutralizeCell)).toEqual([
      "'=1+1",
      "'+A1",
      "'-2",
      "'@SUM(A1)",
      "plain",
    ]);
    // A hostile summary, as any future free-text field could produce.
    await t.ds.query(
      `INSERT INTO audit_events (action, summary, actor_email) VALUES ('study.updated', '=HYPERLINK("http://x.test")', '@attacker')`,
    );
    const res = await admin.get("/api/audit/export.csv").expect(200);
    expect(res.headers["content-type"]).toMatch(/text\/csv/);
    expect(res.text).toContain(`"'=HYPERLINK(""http://x.test"")"`);
    expect(res.text).toContain("'@attacker");
    for (const line of res.text.split("\r\n").slice(1))
      for (const cell of line.split(",")) expect(cell).not.toMatch(/^[=+\-@]/);
  });
});
