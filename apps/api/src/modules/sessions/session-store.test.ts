import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SESSION_COOKIE } from "../../app.js";
import { anon, signedIn } from "../../test-support/agents.js";
import { makeTestApp } from "../../test-support/test-app.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
beforeAll(async () => {
  t = await makeTestApp();
});
afterAll(async () => t.services.stop());

const liveRows = async () =>
  Number((await t.ds.query(`SELECT count(*) AS n FROM sessions WHERE expires_at >= 0`))[0].n);

/** The session id inside a signed express-session cookie ("s:<sid>.<signature>"). */
function sidOf(res: request.Response): string {
  const cookie = ([] as string[])
    .concat(res.headers["set-cookie"] ?? [])
    .find((c) => c.startsWith(SESSION_COOKIE));
  const value = decodeURIComponent(cookie!.split(";")[0]!.split("=")[1]!);
  return value.slice(2, value.lastIndexOf("."));
}

const promisify =
  <A extends unknown[]>(fn: (...a: [...A, (e?: unknown) => void]) => void) =>
  (...a: A) =>
    new Promise<void>((resolve, reject) => fn(...a, (e?: unknown) => (e ? reject(e) : resolve())));

describe("the session store never brings back an ended session", () => {
  it("ignores a touch or a save that arrives after destroy (a request still in flight)", async () => {
    const store = t.sessionStore;
    const data = { cookie: { expires: new Date(Date.now() + 3_600_000) }, passport: { user: 1 } } as never;
    await promisify(store.set.bind(store))("sid-in-flight", data);
    await promisify(store.destroy.bind(store))("sid-in-flight");
    await promisify(store.touch.bind(store))("sid-in-flight", data);
    await promisify(store.set.bind(store))("sid-in-flight", data);
    const got = await new Promise((resolve) => store.get("sid-in-flight", (_e, s) => resolve(s)));
    expect(got).toBeNull();
  });

  it("keeps a session ended by a password change ended when its last request finishes", async () => {
    // Two browsers of one account; the second changes the password.
    const first = request.agent(t.app);
    const token = (await first.get("/api/auth/csrf")).body.token as string;
    const login = await first
      .post("/api/auth/login")
      .set("x-csrf-token", token)
      .send({ email: "reviewer@waymark.test", password: t.env.demoPassword })
      .expect(200);
    const sid = sidOf(login);
    const loaded = await new Promise<unknown>((resolve) => t.sessionStore.get(sid, (_e, s) => resolve(s)));
    const second = await signedIn(t.app, "reviewer", t.env.demoPassword);
    await second
      .put("/api/auth/password")
      .send({ currentPassword: t.env.demoPassword, newPassword: "a-much-longer-new-pass-phrase-9" })
      .expect(204);
    await first.get("/api/auth/me").expect(401);
    // The first browser's upload, started before the change, now finishes and saves its session.
    await promisify(t.sessionStore.set.bind(t.sessionStore))(sid, loaded as never);
    await first.get("/api/auth/me").expect(401);
    // Put the password back for the other tests.
    await second
      .put("/api/auth/password")
      .set("x-csrf-token", (await second.get("/api/auth/me")).headers["x-csrf-token"] as string)
      .send({ currentPassword: "a-much-longer-new-pass-phrase-9", newPassword: t.env.demoPassword })
      .expect(204);
  });
});

describe("session work only where a request needs it", () => {
  it("writes no session row for anonymous reads; a CSRF token is made only when asked for", async () => {
    await t.ds.query(`DELETE FROM sessions`);
    const anonymous = request.agent(t.app);
    await anonymous.get("/api/health").expect(200);
    const config = await anonymous.get("/api/config").expect(200);
    expect(config.headers["x-csrf-token"]).toBeUndefined();
    await anonymous.get("/api/studies").expect(401);
    expect(await liveRows()).toBe(0);
    await anonymous.get("/api/auth/csrf").expect(200);
    expect(await liveRows()).toBe(1);
  });

  it("does not load the session for /api/health, and writes none on unchanged signed-in reads", async () => {
    const agent = await signedIn(t.app, "analyst", t.env.demoPassword);
    const store = t.sessionStore;
    let reads = 0;
    let writes = 0;
    const [get, set, touch] = [store.get, store.set, store.touch];
    store.get = (...a) => (reads++, get.apply(store, a));
    store.set = (...a) => (writes++, set.apply(store, a));
    // A touch within the rewrite interval returns without writing; count only the ones that would.
    const before = JSON.stringify(await t.ds.query(`SELECT data, expires_at FROM sessions`));
    store.touch = (...a) => touch.apply(store, a);
    try {
      await agent.get("/api/health").expect(200);
      expect(reads).toBe(0);
      for (let i = 0; i < 3; i++) await agent.get("/api/studies").expect(200);
      await agent.get("/api/auth/me").expect(200);
      expect(reads).toBe(4);
      expect(writes).toBe(0);
      expect(JSON.stringify(await t.ds.query(`SELECT data, expires_at FROM sessions`))).toBe(before);
    } finally {
      Object.assign(store, { get, set, touch });
    }
  });

  it("refuses a first sign-in without a token as csrf_invalid; with the token asked for, it succeeds (the web client's retry)", async () => {
    const browser = request.agent(t.app);
    const first = await browser
      .post("/api/auth/login")
      .send({ email: "reviewer@waymark.test", password: t.env.demoPassword });
    expect([first.status, first.body.error.code]).toEqual([403, "csrf_invalid"]);
    const { token } = (await browser.get("/api/auth/csrf").expect(200)).body;
    await browser
      .post("/api/auth/login")
      .set("x-csrf-token", token)
      .send({ email: "reviewer@waymark.test", password: t.env.demoPassword })
      .expect(200);
  });

  it("gives a new CSRF token at sign-in and refuses the one from before", async () => {
    const agent = await anon(t.app);
    const before = (await agent.get("/api/auth/csrf")).body.token as string;
    const login = await agent
      .post("/api/auth/login")
      .send({ email: "writer@waymark.test", password: t.env.demoPassword })
      .expect(200);
    const after = login.headers["x-csrf-token"] as string;
    expect(after).toBeTruthy();
    expect(after).not.toBe(before);
    const stale = await agent.post("/api/auth/logout").set("x-csrf-token", before);
    expect(stale.status).toBe(403);
    await agent.post("/api/auth/logout").set("x-csrf-token", after).expect(204);
  });
});

describe("re-authentication is throttled and audited", () => {
  it("refuses a sixth wrong current password within 15 minutes with 429, and audits each failure", async () => {
    const agent = await signedIn(t.app, "admin", t.env.demoPassword);
    const token = (await agent.get("/api/auth/me")).headers["x-csrf-token"] as string;
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) {
      const res = await agent
        .put("/api/auth/password")
        .set("x-csrf-token", token)
        .send({ currentPassword: `wrong-${i}`, newPassword: "another-long-pass-phrase-77" });
      statuses.push(res.status);
      if (res.status === 429) expect(res.body.error.message).toMatch(/Too many wrong passwords/);
    }
    expect(statuses).toEqual([403, 403, 403, 403, 403, 429]);
    const audited = await t.ds.query(
      `SELECT count(*) AS n FROM audit_events WHERE action = 'auth.reauth-failed' AND actor_email = 'admin@waymark.test'`,
    );
    expect(Number(audited[0].n)).toBe(5);
  });
});
