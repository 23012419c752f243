import request from "supertest";
import { anon, signedIn } from "../../test-support/agents.js";
import { beforeAll, describe, expect, it } from "vitest";
import { makeTestApp } from "../../test-support/test-app.js";
import { DEMO_USERS } from "../../db/seeds/demo-users.js";

let app: Awaited<ReturnType<typeof makeTestApp>>;
beforeAll(async () => {
  app = await makeTestApp();
});

const errorShape = expect.objectContaining({
  error: { code: expect.any(String), message: expect.any(String) },
});

describe("POST /api/auth/login", () => {
  it.each(DEMO_USERS)(
    "signs in the demo $role and sets an httpOnly SameSite=Lax cookie",
    async ({ email, role }) => {
      const res = await (
        await anon(app.app)
      )
        .post("/api/auth/login")
        .send({ email, password: app.env.demoPassword });
      expect(res.status).toBe(200);
      expect(res.body.user).toMatchObject({ email, role, active: true });
      expect(res.body.user.passwordHash).toBeUndefined();
      const cookie = String(res.headers["set-cookie"]);
      expect(cookie).toMatch(/waymark\.sid=/);
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Lax/);
    },
  );

  it("gives 401 for a wrong password, with the same message as for an unknown e-mail", async () => {
    const wrong = await (
      await anon(app.app)
    )
      .post("/api/auth/login")
      .send({ email: "analyst@waymark.test", password: "nope" });
    const unknown = await (
      await anon(app.app)
    )
      .post("/api/auth/login")
      .send({ email: "nobody@waymark.test", password: "nope" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(errorShape);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
    expect(wrong.body.error.message).not.toMatch(/password is|e-mail is|no user/i);
  });

  it("rejects a malformed body with 400 naming the field", async () => {
    const res = await (
      await anon(app.app)
    )
      .post("/api/auth/login")
      .send({ email: "not-an-email", password: "" });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("validation_failed");
    expect(res.body.error.message).toMatch(/^email:/);
  });
});

describe("GET /api/auth/me and POST /api/auth/logout", () => {
  it("is 401 when signed out", async () => {
    const res = await request(app.app).get("/api/auth/me");
    expect(res.status).toBe(401);
    expect(res.body).toEqual(errorShape);
  });

  it("returns the user while signed in and 401 after logout", async () => {
    const agent = await anon(app.app);
    const login = await agent
      .post("/api/auth/login")
      .send({ email: "reviewer@waymark.test", password: app.env.demoPassword })
      .expect(200);
    agent.set("x-csrf-token", login.headers["x-csrf-token"] as string);
    const me = await agent.get("/api/auth/me").expect(200);
    expect(me.body.user.role).toBe("reviewer");
    await agent.post("/api/auth/logout").expect(204);
    await agent.get("/api/auth/me").expect(401);
  });

  it("ends the session when the account is deactivated", async () => {
    const agent = await anon(app.app);
    await agent
      .post("/api/auth/login")
      .send({ email: "writer@waymark.test", password: app.env.demoPassword })
      .expect(200);
    await app.ds.query(`UPDATE users SET active = false WHERE email = 'writer@waymark.test'`);
    await agent.get("/api/auth/me").expect(401);
    await app.ds.query(`UPDATE users SET active = true WHERE email = 'writer@waymark.test'`);
  });
});

describe("GET /api/health", () => {
  it("reports ok with the version", async () => {
    const res = await request(app.app).get("/api/health").expect(200);
    expect(res.body).toEqual({ status: "ok", version: expect.stringMatching(/^\d+\.\d+\.\d+/) });
  });

  it("sends security headers with a Content-Security-Policy that allows only our own origin (helmet)", async () => {
    const res = await (await anon(app.app)).get("/api/health").expect(200);
    const csp = String(res.headers["content-security-policy"]);
    expect(csp).toMatch(/default-src 'self'/);
    expect(csp).toMatch(/script-src 'self'(;|$)/);
    expect(csp).toMatch(/font-src 'self'(;|$)/);
    expect(csp).not.toMatch(/https:|upgrade-insecure-requests/);
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
    expect(res.headers["x-powered-by"]).toBeUndefined();
  });

  it("unknown API paths get 404 in the error shape", async () => {
    const res = await request(app.app).get("/api/nowhere").expect(404);
    expect(res.body).toEqual(errorShape);
  });
});

describe("CSRF protection (synchronizer token, csrf-sync)", () => {
  it("refuses a cross-site form post that cannot carry the token, even with a valid session cookie", async () => {
    const agent = await signedInWithoutToken();
    const res = await agent
      .post("/api/studies")
      .type("form")
      .set("origin", "https://attacker.example")
      .send("title=x&objective=y&outcomeName=z&outcomeUnit=&factorName=f&levels=a&levels=b&context=general");
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("csrf_invalid");
    const count = await app.ds.query(`SELECT count(*) AS n FROM studies`);
    expect(Number(count[0].n)).toBe(0);
  });

  it("replaces the token at sign-in, as it does the session id", async () => {
    const agent = await anon(app.app);
    const before = await agent.get("/api/auth/csrf");
    const login = await agent
      .post("/api/auth/login")
      .send({ email: "analyst@waymark.test", password: app.env.demoPassword })
      .expect(200);
    expect(String(login.headers["set-cookie"])).toMatch(/waymark\.sid=/);
    const after = await agent.get("/api/auth/csrf");
    expect(after.body.token).not.toBe(before.body.token);
    expect(login.headers["x-csrf-token"]).toBe(after.body.token);
  });
});

/** A browser that is signed in (has the cookie) but never read the token: what a forged cross-site post looks like. */
async function signedInWithoutToken() {
  const agent = await anon(app.app);
  await agent
    .post("/api/auth/login")
    .send({ email: "analyst@waymark.test", password: app.env.demoPassword })
    .expect(200);
  agent.set("x-csrf-token", "");
  return agent;
}

describe("PUT /api/auth/password", () => {
  it("checks the current password and the new one's strength, then ends every other session", async () => {
    const here = await signedIn(app.app, "writer", app.env.demoPassword);
    const elsewhere = await signedIn(app.app, "writer", app.env.demoPassword);
    const wrong = await here
      .put("/api/auth/password")
      .send({ currentPassword: "nope", newPassword: "violet-harbour-kettle-19" })
      .expect(403);
    expect(wrong.body.error.message).toMatch(/^currentPassword:/);
    const weak = await here
      .put("/api/auth/password")
      .send({ currentPassword: app.env.demoPassword, newPassword: "password1234" })
      .expect(400);
    expect(weak.body.error.message).toMatch(/^newPassword:/);
    await here
      .put("/api/auth/password")
      .send({ currentPassword: app.env.demoPassword, newPassword: "violet-harbour-kettle-19" })
      .expect(204);
    await elsewhere.get("/api/auth/me").expect(401);
    await here.get("/api/auth/me").expect(200);
    await (
      await anon(app.app)
    )
      .post("/api/auth/login")
      .send({ email: "writer@waymark.test", password: app.env.demoPassword })
      .expect(401);
    await (
      await anon(app.app)
    )
      .post("/api/auth/login")
      .send({ email: "writer@waymark.test", password: "violet-harbour-kettle-19" })
      .expect(200);
    // Put the demo password back for the other tests in this file.
    await here
      .put("/api/auth/password")
      .send({ currentPassword: "violet-harbour-kettle-19", newPassword: "quartz-meadow-lantern-58" })
      .expect(204);
    await app.ds.query(
      `UPDATE users SET password_hash = (SELECT password_hash FROM users WHERE email = 'analyst@waymark.test') WHERE email = 'writer@waymark.test'`,
    );
  });
});
