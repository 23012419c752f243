import { describe, expect, it } from "vitest";
import { closeTestDatabase, openTestDatabase } from "../test-support/test-database.js";
import { sql } from "../test-support/sql.js";
import { isPostgres } from "./driver.js";
import { inTransaction } from "./in-transaction.js";
import { lockRowForWrite } from "./row-lock.js";
import { ENTITY_DRIVER } from "./column-types.js";

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));
const insert = (db: Parameters<typeof sql>[0], summary: string) =>
  sql(db, `INSERT INTO audit_events (action, summary) VALUES ('study.created', :summary)`, { summary });
const summaries = async (db: Parameters<typeof sql>[0]) =>
  (await sql<{ summary: string }>(db, `SELECT summary FROM audit_events ORDER BY id`)).map((r) => r.summary);

describe("inTransaction", () => {
  it("rolls back a failed transaction alone and carries on with the next", async () => {
    const { ds } = await openTestDatabase();
    const failing = inTransaction(ds, async (tx) => {
      await insert(tx, "doomed");
      await pause(5);
      throw new Error("boom");
    });
    const next = inTransaction(ds, (tx) => insert(tx, "kept"));
    await expect(failing).rejects.toThrow("boom");
    await next;
    expect(await summaries(ds)).toEqual(["kept"]);
    await closeTestDatabase(ds);
  });
});

describe.skipIf(ENTITY_DRIVER !== "sqlite")("inTransaction on SQLite (the in-process queue)", () => {
  it("keeps overlapping transactions whole on SQLite's single connection", async () => {
    const { ds } = await openTestDatabase();
    // Each transaction yields to the event loop mid-way, as real work (I/O, a worker) does.
    const work = (label: string) =>
      inTransaction(ds, async (tx) => {
        await insert(tx, `${label} start`);
        await pause(10);
        await insert(tx, `${label} end`);
      });
    await Promise.all(["a", "b", "c"].map(work));
    // Whole and in order: no transaction's rows interleave with another's.
    expect(await summaries(ds)).toEqual(["a start", "a end", "b start", "b end", "c start", "c end"]);
    await closeTestDatabase(ds);
  });

  it("plain overlapping ds.transaction calls collide, which is why the queue exists", async () => {
    const { ds } = await openTestDatabase();
    const raw = () =>
      ds.transaction(async (tx) => {
        await insert(tx, "x");
        await pause(10);
      });
    const results = await Promise.allSettled([raw(), raw()]);
    expect(results.some((r) => r.status === "rejected")).toBe(true);
    await ds.destroy().catch(() => undefined);
  });
});

describe.skipIf(ENTITY_DRIVER !== "postgres")(
  "inTransaction on PostgreSQL (pooled connections, row locks)",
  () => {
    it("runs overlapping transactions at once on their own connections, each committed whole", async () => {
      const { ds } = await openTestDatabase();
      expect(isPostgres(ds)).toBe(true);
      // Each waits (up to 5 s) until all three are open: with a queue they never would be.
      let started = 0;
      let allStarted!: () => void;
      const together = new Promise<void>((r) => (allStarted = r));
      const sawAll: boolean[] = [];
      const work = (label: string) =>
        inTransaction(ds, async (tx) => {
          await insert(tx, `${label} start`);
          if (++started === 3) allStarted();
          sawAll.push(await Promise.race([together.then(() => true), pause(5000).then(() => false)]));
          await insert(tx, `${label} end`);
        });
      await Promise.all(["a", "b", "c"].map(work));
      // No queue: the three were open together, and each left both of its rows.
      expect(sawAll).toEqual([true, true, true]);
      expect((await summaries(ds)).sort()).toEqual([
        "a end",
        "a start",
        "b end",
        "b start",
        "c end",
        "c start",
      ]);
      await closeTestDatabase(ds);
    });

    it("a second writer that locks the same row waits, then reads what the first committed", async () => {
      const { ds } = await openTestDatabase();
      await sql(
        ds,
        `INSERT INTO users (email, display_name, role, password_hash) VALUES ('a@x.test', 'A', 'analyst', 'x')`,
      );
      const [user] = await sql<{ id: number }>(ds, `SELECT id FROM users`);
      const read = (tx: Parameters<typeof sql>[0]) =>
        sql<{ display_name: string }>(tx, `SELECT display_name FROM users WHERE id = :id`, { id: user!.id });
      let firstHasLock!: () => void;
      const locked = new Promise<void>((r) => (firstHasLock = r));
      const first = inTransaction(ds, async (tx) => {
        await lockRowForWrite(tx, "users", user!.id);
        firstHasLock();
        await pause(300); // long enough that, without the lock, the second would read the old name
        await sql(tx, `UPDATE users SET display_name = 'B' WHERE id = :id`, { id: user!.id });
      });
      await locked;
      const seen = await inTransaction(ds, async (tx) => {
        await lockRowForWrite(tx, "users", user!.id);
        return (await read(tx))[0]!.display_name;
      });
      await first;
      expect(seen).toBe("B");
      await closeTestDatabase(ds);
    });
  },
);
