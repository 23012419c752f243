import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DataSource } from "typeorm";
import { createApp } from "../app.js";
import { startServices } from "../bootstrap.js";
import { loadEnv } from "../config/env.js";
import { AuditEvent } from "../modules/audit/audit-event.entity.js";
import { Invitation } from "../modules/invitations/invitation.entity.js";
import { OutboxMessage } from "../modules/mail/outbox-message.entity.js";
import { closeTestDatabase, openTestDatabase } from "../test-support/test-database.js";
import { InviteAdminRefused, inviteAdmin } from "./invite-admin.js";

const PUBLIC_URL = "https://waymark.example.org";

/** A new database outside demo mode: no accounts at all, as an operator's first start leaves it. */
let ds: DataSource;
let app: ReturnType<typeof createApp>["app"];
let stopServices: () => Promise<void>;

beforeAll(async () => {
  ({ ds } = await openTestDatabase());
  const env = loadEnv({
    NODE_ENV: "test",
    DATABASE_PATH: ":memory:",
    BCRYPT_COST: "4",
    WAYMARK_DEMO: "0",
    PUBLIC_URL,
  });
  const services = await startServices(ds, env);
  app = createApp(ds, env, services).app;
  stopServices = () => services.stop();
});
afterAll(async () => {
  await stopServices();
  await closeTestDatabase(ds);
});

const tokenOf = (link: string) => link.slice(`${PUBLIC_URL}/invite/`.length);

describe("invite-admin: the first admin of a new database", () => {
  it("refuses a missing, malformed or extra argument and writes nothing", async () => {
    await expect(inviteAdmin(ds, [], PUBLIC_URL)).rejects.toThrow(/no e-mail address given.*Usage/);
    await expect(inviteAdmin(ds, ["not-an-address"], PUBLIC_URL)).rejects.toThrow(
      /"not-an-address" is not a valid e-mail address/,
    );
    await expect(inviteAdmin(ds, ["a@example.org", "b@example.org"], PUBLIC_URL)).rejects.toThrow(
      /give one e-mail address/,
    );
    await expect(inviteAdmin(ds, ["a@example.org", "--force"], PUBLIC_URL)).rejects.toThrow(
      /unknown option --force/,
    );
    await expect(inviteAdmin(ds, [], PUBLIC_URL)).rejects.toBeInstanceOf(InviteAdminRefused);
    expect(await ds.getRepository(Invitation).count()).toBe(0);
  });

  it("invites, audits as system, queues the e-mail, and its link signs up an admin who can sign in", async () => {
    const r = await inviteAdmin(ds, ["Founder@Example.org"], PUBLIC_URL);
    expect(r.email).toBe("founder@example.org");
    expect(r.link).toMatch(new RegExp(`^${PUBLIC_URL}/invite/[A-Za-z0-9_-]{43}$`));

    const inv = await ds.getRepository(Invitation).findOneByOrFail({ email: "founder@example.org" });
    expect(inv).toMatchObject({ role: "admin", invitedById: null, usedAt: null, revokedAt: null });

    const events = await ds.getRepository(AuditEvent).findBy({ action: "invitation.sent" });
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({
      actorId: null,
      actorEmail: null,
      ip: null,
      summary: "Invited founder@example.org as admin from the command line",
    });
    expect(events[0]?.after).toEqual({
      email: "founder@example.org",
      role: "admin",
      invitationId: inv.id,
      via: "command line",
    });

    const mail = await ds.getRepository(OutboxMessage).findBy({ to: "founder@example.org" });
    expect(mail).toHaveLength(1);
    expect(mail[0]?.text).toContain(r.link);

    // The link's page, then accepting it through the HTTP API, as the web app does.
    const agent = request.agent(app);
    const csrf = (await agent.get("/api/auth/csrf").expect(200)).body.token as string;
    const shown = await agent.get(`/api/invitations/${tokenOf(r.link)}`).expect(200);
    expect(shown.body.invitation).toMatchObject({ email: "founder@example.org", role: "admin" });
    const accepted = await agent
      .post(`/api/invitations/${tokenOf(r.link)}/accept`)
      .set("x-csrf-token", csrf)
      .send({ displayName: "Noor Adeyemi", password: "quartz lantern meadow 41" })
      .expect(201);
    expect(accepted.body.user).toMatchObject({ email: "founder@example.org", role: "admin", active: true });

    // A new browser signs in with the password just set and reaches an admin-only list.
    const fresh = request.agent(app);
    const csrf2 = (await fresh.get("/api/auth/csrf").expect(200)).body.token as string;
    const login = await fresh
      .post("/api/auth/login")
      .set("x-csrf-token", csrf2)
      .send({ email: "founder@example.org", password: "quartz lantern meadow 41" })
      .expect(200);
    expect(login.body.user.role).toBe("admin");
    fresh.set("x-csrf-token", login.headers["x-csrf-token"] as string);
    const list = await fresh.get("/api/invitations").expect(200);
    expect(list.body.invitations).toEqual([
      expect.objectContaining({ email: "founder@example.org", state: "used", invitedBy: null }),
    ]);
    // The link works once.
    await agent.get(`/api/invitations/${tokenOf(r.link)}`).expect(410);
  });

  it("refuses while an active admin exists unless --another is given", async () => {
    await expect(inviteAdmin(ds, ["second@example.org"], PUBLIC_URL)).rejects.toThrow(
      /already has 1 active admin.*--another/,
    );
    expect(await ds.getRepository(Invitation).countBy({ email: "second@example.org" })).toBe(0);

    const r = await inviteAdmin(ds, ["second@example.org", "--another"], PUBLIC_URL);
    expect(r.link).toMatch(new RegExp(`^${PUBLIC_URL}/invite/`));
    expect(await ds.getRepository(Invitation).countBy({ email: "second@example.org" })).toBe(1);

    // An address that already has an account is refused by the invitation service, in plain words.
    await expect(inviteAdmin(ds, ["founder@example.org", "--another"], PUBLIC_URL)).rejects.toThrow(
      "founder@example.org already has an account.",
    );
  });
});
