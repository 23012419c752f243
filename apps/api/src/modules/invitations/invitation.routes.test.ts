import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { anon, signedIn } from "../../test-support/agents.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { Invitation } from "./invitation.entity.js";
import { IsNull } from "typeorm";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let admin: Awaited<ReturnType<typeof signedIn>>;
const STRONG = "copper-lantern-orchard-42";

beforeAll(async () => {
  t = await makeTestApp();
  admin = await signedIn(t.app, "admin", t.env.demoPassword);
});

/** Reads the invitation link out of the message the fake SMTP server received. */
async function linkFor(email: string): Promise<string> {
  await t.services.mail.kick();
  for (let i = 0; i < 50; i++) {
    const { body } = await request(t.app).get("/api/dev/mail").expect(200);
    const m = body.messages.find((x: { to: string }) => x.to.includes(email));
    if (m) {
      const link = /\/invite\/([A-Za-z0-9_-]+)/.exec(m.text);
      if (link) return link[1]!;
    }
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no invitation mail for ${email}`);
}

describe("invitations", () => {
  it("sends an e-mail with a single-use link; accepting sets name and password and signs in", async () => {
    await admin
      .post("/api/invitations")
      .send({ email: "new.reviewer@waymark.test", role: "reviewer" })
      .expect(201);
    const { body } = await request(t.app).get("/api/dev/mail");
    const mail =
      body.messages.find((m: { to: string }) => m.to.includes("new.reviewer@waymark.test")) ?? null;
    const token = await linkFor("new.reviewer@waymark.test");
    if (mail) expect(mail.subject).toMatch(/^Waymark: /);
    // The token itself is never stored, only its hash.
    const rows = await t.ds.query(
      `SELECT token_hash FROM invitations WHERE email = 'new.reviewer@waymark.test'`,
    );
    expect(rows[0].token_hash).not.toBe(token);
    const info = await request(t.app).get(`/api/invitations/${token}`).expect(200);
    expect(info.body.invitation).toMatchObject({ email: "new.reviewer@waymark.test", role: "reviewer" });
    const weak = await (
      await anon(t.app)
    )
      .post(`/api/invitations/${token}/accept`)
      .send({ displayName: "Noor Haddad", password: "password1234" })
      .expect(400);
    expect(weak.body.error.message).toMatch(/too common|easy to guess/);
    const agent = await anon(t.app);
    const ok = await agent
      .post(`/api/invitations/${token}/accept`)
      .send({ displayName: "Noor Haddad", password: STRONG })
      .expect(201);
    expect(ok.body.user).toMatchObject({ email: "new.reviewer@waymark.test", role: "reviewer" });
    await agent.get("/api/auth/me").expect(200);
    const reuse = await (
      await anon(t.app)
    )
      .post(`/api/invitations/${token}/accept`)
      .send({ displayName: "Again", password: STRONG })
      .expect(410);
    expect(reuse.body.error.message).toMatch(/already been used/);
  });

  it("revokes the old link on re-invite and refuses an expired one with a clear message", async () => {
    await admin.post("/api/invitations").send({ email: "twice@waymark.test", role: "writer" }).expect(201);
    const first = await linkFor("twice@waymark.test");
    await t.ds.query(`DELETE FROM dev_mailbox`);
    await admin.post("/api/invitations").send({ email: "twice@waymark.test", role: "writer" }).expect(201);
    const second = await linkFor("twice@waymark.test");
    expect(second).not.toBe(first);
    const old = await request(t.app).get(`/api/invitations/${first}`).expect(410);
    expect(old.body.error.code).toBe("invitation_revoked");
    await t.ds
      .getRepository(Invitation)
      .update(
        { email: "twice@waymark.test", revokedAt: IsNull() },
        { expiresAt: new Date(Date.now() - 60 * 60_000) },
      );
    const expired = await request(t.app).get(`/api/invitations/${second}`).expect(410);
    expect(expired.body.error.message).toMatch(/expired/);
    await request(t.app).get(`/api/invitations/not-a-token`).expect(404);
  });

  it("only admins invite", async () => {
    const analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
    await analyst.post("/api/invitations").send({ email: "x@waymark.test", role: "writer" }).expect(403);
    await admin.post("/api/invitations").send({ email: "analyst@waymark.test", role: "writer" }).expect(409);
  });
});

describe("people and settings", () => {
  it("changes roles, deactivates (ending sessions at once) and protects the last admin", async () => {
    const users = await admin.get("/api/users").expect(200);
    const writer = users.body.users.find((u: { email: string }) => u.email === "writer@waymark.test");
    const me = users.body.users.find((u: { email: string }) => u.email === "admin@waymark.test");
    const writerAgent = await signedIn(t.app, "writer", t.env.demoPassword);
    await admin.patch(`/api/users/${writer.id}`).send({ active: false }).expect(200);
    await writerAgent.get("/api/auth/me").expect(401);
    await (
      await anon(t.app)
    )
      .post("/api/auth/login")
      .send({ email: "writer@waymark.test", password: t.env.demoPassword })
      .expect(401);
    await admin.patch(`/api/users/${writer.id}`).send({ active: true }).expect(200);
    const last = await admin.patch(`/api/users/${me.id}`).send({ role: "analyst" }).expect(409);
    expect(last.body.error.message).toMatch(/last active admin/);
    await admin.patch(`/api/users/${me.id}`).send({ active: false }).expect(409);
  });

  it("sets the organization's test policy, which new plans take as their defaults", async () => {
    await admin
      .put("/api/organization/settings")
      .send({ policy: "welch-first", defaultAlpha: 0.01, defaultAdjust: "bh" })
      .expect(200);
    const analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
    const s = await analyst
      .post("/api/studies")
      .send({
        title: "t",
        objective: "o",
        outcomeName: "y",
        outcomeUnit: "",
        factorName: "f",
        levels: ["a", "b", "c"],
        context: "general",
      })
      .expect(201);
    expect(s.body.study.plan).toMatchObject({ policy: "welch-first", alpha: 0.01, adjust: "bh" });
    await analyst.put("/api/organization/settings").send({ policy: "classic-first" }).expect(403);
    await admin
      .put("/api/organization/settings")
      .send({ policy: "classic-first", defaultAlpha: 0.05, defaultAdjust: "holm" })
      .expect(200);
  });
});
