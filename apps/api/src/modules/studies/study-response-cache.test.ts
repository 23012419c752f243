import type { DataSource } from "typeorm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createApp } from "../../app.js";
import { startServices } from "../../bootstrap.js";
import { loadEnv } from "../../config/env.js";
import { isPostgres } from "../../db/driver.js";
import { inTransaction } from "../../db/in-transaction.js";
import { MARKED_TABLES } from "../../db/migrations/1764900000200-data-change-marker.js";
import { seedDemoStudies } from "../../db/seeds/demo-studies.js";
import { seedDemoUsers } from "../../db/seeds/demo-users.js";
import { signedIn } from "../../test-support/agents.js";
import { YIELD_CSV } from "../../test-support/analysed-study.js";
import { openSharedDatabase } from "../../test-support/shared-database.js";
import { sql } from "../../test-support/sql.js";
import { User } from "../users/user.entity.js";
import { listFilter } from "./study.access.js";
import { studyDtos } from "./study.service.js";
import { findStudies } from "./study-list-records.js";
import { readChangeMarker } from "./study-response-cache.js";
import { FIXTURE_DESIGN } from "../../test-support/locked-study.js";

// Property (common practice for a cache): after every write, through the API, in plain SQL, or
// through another instance on the same database, each role's cached list and study pages equal
// a fresh computation by `studyDtos`. Two app instances share one database; a third connection
// computes the fresh answers.

const ROLES = ["analyst", "reviewer", "writer", "admin"] as const;
type Role = (typeof ROLES)[number];
type Agent = Awaited<ReturnType<typeof signedIn>>;

let shared: Awaited<ReturnType<typeof openSharedDatabase>>;
let fresh: DataSource;
const stops: Array<() => Promise<void>> = [];
/** agents per instance, per role */
const agents: Array<Record<Role, Agent>> = [];
const apps: Array<Awaited<ReturnType<typeof instance>>["app"]> = [];
let password: string;
const instances: DataSource[] = [];

async function instance(ds: DataSource) {
  const env = loadEnv({
    NODE_ENV: "test",
    DATABASE_PATH: ":memory:",
    ...(isPostgres(ds) ? { DATABASE_URL: shared.target } : {}),
    BCRYPT_COST: "4",
    UPLOAD_LIMIT_MB: "1",
    WAYMARK_DEMO: "1",
  });
  const services = await startServices(ds, env);
  const built = createApp(ds, env, services);
  stops.push(async () => {
    built.analysisRuns.stopSweeping();
    await services.stop();
    await services.mail.kick().catch(() => undefined);
  });
  return { app: built.app, env };
}

beforeAll(async () => {
  shared = await openSharedDatabase();
  fresh = await shared.connect();
  const first = await shared.connect();
  const second = await shared.connect();
  const probe = loadEnv({ NODE_ENV: "test", DATABASE_PATH: ":memory:", WAYMARK_DEMO: "1" });
  password = probe.demoPassword;
  await seedDemoUsers(fresh, password, 4);
  await seedDemoStudies(fresh, password);
  for (const ds of [first, second]) {
    const { app } = await instance(ds);
    apps.push(app);
    instances.push(ds);
    const byRole = {} as Record<Role, Agent>;
    for (const role of ROLES) byRole[role] = await signedIn(app, role, password);
    agents.push(byRole);
  }
}, 120_000);
afterAll(async () => {
  for (const stop of stops) await stop();
  await shared.close();
});

const plain = (v: unknown) => JSON.parse(JSON.stringify(v));
const userOf = (role: Role) => fresh.getRepository(User).findOneByOrFail({ email: `${role}@waymark.test` });

/** Each role's list and every study page, on both instances, against a fresh computation. */
async function expectFresh(step: string) {
  const everyStudy = await findStudies(fresh, {});
  for (const role of ROLES) {
    const user = await userOf(role);
    const expectedList = plain({
      studies: await studyDtos(fresh, await findStudies(fresh, listFilter(user))),
    });
    for (const [n, byRole] of agents.entries()) {
      const list = await byRole[role].get("/api/studies").expect(200);
      expect({ step, role, instance: n, body: list.body }).toEqual({
        step,
        role,
        instance: n,
        body: expectedList,
      });
      for (const s of everyStudy) {
        const readable =
          (user.role !== "analyst" || s.ownerId === user.id) &&
          (user.role !== "writer" || s.status === "approved");
        const page = await byRole[role].get(`/api/studies/${s.id}`);
        expect({ step, role, study: s.id, status: page.status }).toEqual({
          step,
          role,
          study: s.id,
          status: readable ? 200 : 403,
        });
        if (readable)
          expect({ step, role, study: s.id, body: page.body }).toEqual({
            step,
            role,
            study: s.id,
            body: plain({ study: (await studyDtos(fresh, [s]))[0] }),
          });
      }
    }
  }
}

describe("the studies response cache", () => {
  it("serves what a fresh computation gives after every step of a study's life, on both instances", async () => {
    const [a, b] = agents as [Record<Role, Agent>, Record<Role, Agent>];
    await expectFresh("start");
    const created = await a.analyst
      .post("/api/studies")
      .send({
        title: "Cached study",
        objective: "Fixture.",
        outcomeName: "Yield",
        outcomeUnit: "g",
        factorName: "Line",
        levels: ["North", "South", "East"],
        controlLevel: null,
        context: "general",
      })
      .expect(201);
    const id = created.body.study.id as number;
    await expectFresh("created");
    await b.analyst.put(`/api/studies/${id}/design`).send(FIXTURE_DESIGN).expect(200);
    await expectFresh("design answered (other instance)");
    await a.analyst.post(`/api/studies/${id}/plan/lock`).expect(200);
    await expectFresh("plan locked");
    const upload = async (agent: Agent, csv: string) =>
      (
        await agent
          .post(`/api/studies/${id}/datasets`)
          .field("groupColumn", "Line")
          .field("outcomeColumn", "Yield (g)")
          .attach("file", Buffer.from(csv), "yield.csv")
          .expect(201)
      ).body.dataset.id as number;
    const v1 = await upload(a.analyst, YIELD_CSV);
    await expectFresh("uploaded");
    await b.analyst.post(`/api/studies/${id}/analyses`).send({ datasetId: v1 }).expect(201);
    await expectFresh("analysed (other instance)");
    await a.analyst.post(`/api/studies/${id}/submit`).send({}).expect(200);
    await expectFresh("submitted");
    await a.reviewer
      .post(`/api/studies/${id}/request-changes`)
      .send({
        comment: "Say how outliers were handled.",
        stepComments: [{ step: "data", body: "Which rows?" }],
      })
      .expect(200);
    await expectFresh("changes requested");
    const page = (await a.analyst.get(`/api/studies/${id}`).expect(200)).body.study;
    await b.analyst
      .post(`/api/studies/${id}/comments/${page.openReview.comments[0].id}/replies`)
      .send({ body: "Rows 4 and 9." })
      .expect(201);
    await expectFresh("replied (other instance)");
    const v2 = await upload(a.analyst, YIELD_CSV.replace("North,10.1", "North,10.4"));
    await expectFresh("second data version");
    await a.analyst.post(`/api/studies/${id}/analyses`).send({ datasetId: v2 }).expect(201);
    await a.analyst.post(`/api/studies/${id}/datasets/${v1}/activate`).send({}).expect(200);
    await expectFresh("first version made active again");
    await a.analyst.post(`/api/studies/${id}/datasets/${v2}/activate`).send({}).expect(200);
    await a.analyst.post(`/api/studies/${id}/submit`).send({}).expect(200);
    await expectFresh("resubmitted");
    await b.reviewer
      .post(`/api/studies/${id}/approve`)
      .send({ password, meaning: "Approved as the analysis of record" })
      .expect(200);
    await expectFresh("approved (other instance)");
    // Plain SQL, past the app: only the database's triggers can tell the instances.
    await sql(fresh, `UPDATE users SET display_name = :name WHERE email = 'analyst@waymark.test'`, {
      name: "Analyst Renamed In SQL",
    });
    await expectFresh("owner renamed in SQL");
    await sql(fresh, `UPDATE studies SET title = :title WHERE id = :id`, { title: "Retitled in SQL", id });
    await expectFresh("study retitled in SQL");
    const reviewer = await userOf("reviewer");
    // A role change ends the account's sessions; it signs in again and sees the new role's list.
    const resign = async () => {
      for (const [n, app] of apps.entries()) agents[n]!.reviewer = await signedIn(app, "reviewer", password);
    };
    await a.admin.patch(`/api/users/${reviewer.id}`).send({ role: "writer" }).expect(200);
    await resign();
    await expectFresh("reviewer made a writer");
    await a.admin.patch(`/api/users/${reviewer.id}`).send({ role: "reviewer" }).expect(200);
    await resign();
    await expectFresh("made a reviewer again");
  }, 300_000);

  it("answers 304 to a client holding the current version, the new bytes after a write, gzipped when asked", async () => {
    const analyst = agents[0]!.analyst;
    const first = await analyst.get("/api/studies").expect(200);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^W\/"/);
    await analyst.get("/api/studies").set("If-None-Match", etag).expect(304);
    const [mine] = (first.body.studies as Array<{ id: number; title: string }>).slice(0, 1);
    await sql(fresh, `UPDATE studies SET title = :title WHERE id = :id`, {
      title: "Changed again",
      id: mine!.id,
    });
    const after = await analyst.get("/api/studies").set("If-None-Match", etag).expect(200);
    expect(after.headers.etag).not.toBe(etag);
    expect(after.body.studies.find((s: { id: number }) => s.id === mine!.id).title).toBe("Changed again");
    // The gzip form (made once per entry) decodes to the same list; the plain form names its length.
    const zipped = await analyst.get("/api/studies").set("Accept-Encoding", "gzip").expect(200);
    expect(zipped.headers["content-encoding"]).toBe("gzip");
    expect(zipped.body).toEqual(after.body);
    const identity = await analyst.get("/api/studies").set("Accept-Encoding", "identity").expect(200);
    expect(identity.headers["content-encoding"]).toBeUndefined();
    expect(Number(identity.headers["content-length"])).toBe(Buffer.byteLength(JSON.stringify(after.body)));
  });

  it("never keeps rows a transaction rolled back, though a read saw them before the rollback", async () => {
    // SQLite: the app's one connection lets a request read an open transaction's rows and marker.
    const analyst = agents[0]!.analyst;
    const [mine] = await findStudies(fresh, listFilter(await userOf("analyst")));
    await expect(
      inTransaction(instances[0]!, async (tx) => {
        await sql(tx, `UPDATE studies SET title = 'Rolled back' WHERE id = :id`, { id: mine!.id });
        await analyst.get("/api/studies").expect(200);
        await analyst.get(`/api/studies/${mine!.id}`).expect(200);
        throw new Error("roll back");
      }),
    ).rejects.toThrow("roll back");
    // A committed write takes the marker value the rolled-back one had.
    await sql(fresh, `UPDATE studies SET objective = 'Committed' WHERE id = :id`, { id: mine!.id });
    await expectFresh("after a rollback and a committed write");
  });

  it("moves the marker on a write to each table the list reads, and the list reads no other table", async () => {
    // Every table named in the SQL that builds the list and a study page has a marker trigger.
    const seen = new Set<string>();
    const spy = vi.spyOn(fresh.logger, "logQuery").mockImplementation((query: string) => {
      for (const m of query.matchAll(/\b(?:FROM|JOIN)\s+"(\w+)"/gi)) seen.add(m[1]!);
    });
    try {
      const all = await findStudies(fresh, {});
      await studyDtos(fresh, all);
      for (const s of all) await studyDtos(fresh, await findStudies(fresh, { id: s.id }));
    } finally {
      spy.mockRestore();
    }
    expect(seen.size).toBeGreaterThan(3);
    const marked = MARKED_TABLES.map((t) => t.table);
    for (const table of seen)
      expect({ table, marked: marked.includes(table) }).toEqual({ table, marked: true });

    // Each marked table's trigger moves the marker: insert a copy of one row (unique columns
    // shifted), read the marker in the same transaction, roll back.
    const shifted: Record<string, Record<string, string>> = {
      users: { email: `'copy-' || "email"` },
      datasets: { version: `"version" + 1000` },
      review_rounds: { round: `"round" + 1000` },
    };
    for (const { table } of MARKED_TABLES) {
      const meta = fresh.entityMetadatas.find((m) => m.tableName === table)!;
      const cols = meta.columns.filter((c) => !c.isPrimary).map((c) => c.databaseName);
      const values = cols.map((c) => shifted[table]?.[c] ?? `"${c}"`);
      const runner = fresh.createQueryRunner();
      await runner.startTransaction();
      try {
        const before = await readChangeMarker(runner.manager);
        // PostgreSQL's marker triggers are deferred to commit; fire them now, inside this transaction.
        if (isPostgres(fresh)) await runner.query(`SET CONSTRAINTS ALL IMMEDIATE`);
        await runner.query(
          `INSERT INTO "${table}" (${cols.map((c) => `"${c}"`).join(", ")}) SELECT ${values.join(", ")} FROM "${table}" WHERE "id" = (SELECT MAX("id") FROM "${table}")`,
        );
        const after = await readChangeMarker(runner.manager);
        expect({ table, moved: BigInt(after) > BigInt(before) }).toEqual({ table, moved: true });
      } finally {
        await runner.rollbackTransaction();
        await runner.release();
      }
    }
  });
});
