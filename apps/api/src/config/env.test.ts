import "reflect-metadata";
import request from "supertest";
import { describe, expect, it } from "vitest";
import { createApp } from "../app.js";
import { closeTestDatabase, openTestDatabase } from "../test-support/test-database.js";
import type { MailDispatcher } from "../modules/mail/mail-dispatcher.js";
import { loadEnv } from "./env.js";

const SECRET = "a-real-secret-of-32-characters!!";

describe("safe defaults outside demo mode (loadEnv)", () => {
  it("refuses to start without SESSION_SECRET when neither demo mode nor the tests are running", () => {
    // NODE_ENV unset, as `npm start` leaves it.
    expect(() => loadEnv({})).toThrow(/SESSION_SECRET: required outside demo mode/);
    expect(() => loadEnv({ NODE_ENV: "production" })).toThrow(/SESSION_SECRET/);
    expect(() => loadEnv({ NODE_ENV: "development" })).toThrow(/SESSION_SECRET/);
    // Backup and restore do not serve requests and need no secret.
    expect(() => loadEnv({}, { purpose: "script" })).not.toThrow();
  });

  it("starts the fake mail server only in demo mode or tests", () => {
    expect(loadEnv({ SESSION_SECRET: SECRET }).fakeMail).toBe(false);
    expect(loadEnv({ NODE_ENV: "development", SESSION_SECRET: SECRET }).fakeMail).toBe(false);
    expect(loadEnv({ WAYMARK_DEMO: "1" }).fakeMail).toBe(true);
    expect(loadEnv({ NODE_ENV: "test" }).fakeMail).toBe(true);
    expect(loadEnv({ WAYMARK_DEMO: "1", SMTP_URL: "smtp://mail.example.org:587" }).fakeMail).toBe(false);
  });

  it("mounts no dev mailbox for anonymous callers outside demo mode", async () => {
    const env = loadEnv({ SESSION_SECRET: SECRET, DATABASE_PATH: ":memory:" });
    const { ds } = await openTestDatabase();
    const mail = { kick: async () => undefined } as unknown as MailDispatcher;
    const { app } = createApp(ds, env, { mail });
    const res = await request(app).get("/api/dev/mail");
    expect(res.status).toBe(404);
    await closeTestDatabase(ds);
  });
});
