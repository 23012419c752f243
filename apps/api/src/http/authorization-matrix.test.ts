import request from "supertest";
import { anon } from "../test-support/agents.js";
import { beforeAll, describe, expect, it } from "vitest";
import { ROLES, type Role } from "../auth/roles.js";
import { decide } from "../auth/policy.js";
import { makeTestApp } from "../test-support/test-app.js";
import { sql } from "../test-support/sql.js";
import { analysedStudy } from "../test-support/analysed-study.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
type Caller = Role | "signed-out" | "deactivated";
const CALLERS: Caller[] = ["signed-out", ...ROLES, "deactivated"];
const agents = new Map<Caller, ReturnType<typeof request.agent>>();

beforeAll(async () => {
  t = await makeTestApp();
  // A fifth account, deactivated after signing in: its session must stop working at once.
  for (const role of ROLES) {
    const a = await anon(t.app);
    const login = await a
      .post("/api/auth/login")
      .send({ email: `${role}@waymark.test`, password: t.env.demoPassword })
      .expect(200);
    a.set("x-csrf-token", login.headers["x-csrf-token"] as string); // sign-in replaces the token
    agents.set(role, a);
  }
  const gone = await anon(t.app);
  await t.ds.query(
    `INSERT INTO users (email, display_name, role, password_hash, active) SELECT 'gone@waymark.test', 'Former Analyst', 'analyst', password_hash, true FROM users WHERE email = 'analyst@waymark.test'`,
  );
  const goneLogin = await gone
    .post("/api/auth/login")
    .send({ email: "gone@waymark.test", password: t.env.demoPassword })
    .expect(200);
  gone.set("x-csrf-token", goneLogin.headers["x-csrf-token"] as string);
  await t.ds.query(`UPDATE users SET active = false WHERE email = 'gone@waymark.test'`);
  agents.set("deactivated", gone);
  agents.set("signed-out", await anon(t.app));
});

/** The status family a policy implies for a caller; the route's own checks may then give 400/404/409/422. */
function expected(route: (typeof t.routes)[number], caller: Caller): "denied-401" | "denied-403" | "allowed" {
  if (route.policy.kind === "public") return "allowed";
  if (caller === "signed-out" || caller === "deactivated") return "denied-401";
  return decide(route.policy, { role: caller, active: true }) === "allow" ? "allowed" : "denied-403";
}

describe("authorization matrix (generated from the route table)", () => {
  it("has a declared policy for every route Express knows about", () => {
    expect(t.routes.length).toBeGreaterThan(25);
    for (const r of t.routes) expect(["public", "signed-in", "roles"]).toContain(r.policy.kind);
  });

  it("answers every route × caller with the status its policy implies", async () => {
    const failures: string[] = [];
    for (const route of t.routes) {
      if (route.path === "/api/auth/logout") continue; // signing out would end the shared sessions; covered in auth tests
      const path = route.path.replace(/:token/g, "no-such-token").replace(/:[A-Za-z]+/g, "999999");
      for (const caller of CALLERS) {
        const agent = agents.get(caller)!;
        const res = await agent[route.method](path).send({});
        const want = expected(route, caller);
        const ok =
          want === "denied-401"
            ? res.status === 401
            : want === "denied-403"
              ? res.status === 403
              : res.status !== 401 && res.status !== 403;
        if (!ok)
          failures.push(
            `${route.method.toUpperCase()} ${route.path} as ${caller}: got ${res.status}, expected ${want}`,
          );
        expect(res.status).toBeLessThan(500);
      }
    }
    expect(failures).toEqual([]);
  }, 120_000);

  it("lets writers read a study and its datasets, checks and analyses only once it is approved", async () => {
    const { studyId, datasetId, analysisId } = await analysedStudy(agents.get("analyst")!);
    // Every study-scoped read route, with this study's ids.
    const reads = t.routes
      .filter((r) => r.method === "get" && r.path.startsWith("/api/studies/:id"))
      .map((r) =>
        r.path
          .replace(":id", String(studyId))
          .replace(":datasetId", String(datasetId))
          .replace(":analysisId", String(analysisId)),
      );
    expect(reads.length).toBeGreaterThan(5);
    const writer = agents.get("writer")!;
    const asWriter = async () =>
      Object.fromEntries(await Promise.all(reads.map(async (p) => [p, (await writer.get(p)).status])));
    const draft = await asWriter();
    for (const p of reads) expect([p, draft[p]]).toEqual([p, 403]);
    const list = await writer.get("/api/studies").expect(200);
    expect(list.body.studies.map((s: { id: number }) => s.id)).not.toContain(studyId);

    await sql(t.ds, `UPDATE studies SET status = 'approved' WHERE id = :studyId`, { studyId });
    const approved = await asWriter();
    for (const p of reads) expect([p, approved[p] === 403 || approved[p] === 401]).toEqual([p, false]);
    const after = await writer.get("/api/studies").expect(200);
    expect(after.body.studies.map((s: { id: number }) => s.id)).toContain(studyId);
  });
});
