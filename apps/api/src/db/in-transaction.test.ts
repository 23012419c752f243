import { describe, expect, it } from "vitest";
import { openDatabase } from "./data-source.js";
import { inTransaction } from "./in-transaction.js";

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe("inTransaction", () => {
  it("keeps overlapping transactions whole on SQLite's single connection", async () => {
    const ds = await openDatabase(":memory:");
    // Each transaction yields to the event loop mid-way, as real work (I/O, a worker) does.
    const work = (label: string) =>
      inTransaction(ds, async (tx) => {
        await tx.query(`INSERT INTO audit_events (action, summary) VALUES ('study.created', ?)`, [
          `${label} start`,
        ]);
        await pause(10);
        await tx.query(`INSERT INTO audit_events (action, summary) VALUES ('study.created', ?)`, [
          `${label} end`,
        ]);
      });
    await Promise.all(["a", "b", "c"].map(work));
    const rows = (await ds.query(`SELECT summary FROM audit_events ORDER BY id`)) as { summary: string }[];
    // Whole and in order: no transaction's rows interleave with another's.
    expect(rows.map((r) => r.summary)).toEqual(["a start", "a end", "b start", "b end", "c start", "c end"]);
    await ds.destroy();
  });

  it("rolls back a failed transaction alone and carries on with the next", async () => {
    const ds = await openDatabase(":memory:");
    const failing = inTransaction(ds, async (tx) => {
      await tx.query(`INSERT INTO audit_events (action, summary) VALUES ('study.created', 'doomed')`);
      await pause(5);
      throw new Error("boom");
    });
    const next = inTransaction(ds, (tx) =>
      tx.query(`INSERT INTO audit_events (action, summary) VALUES ('study.created', 'kept')`),
    );
    await expect(failing).rejects.toThrow("boom");
    await next;
    const rows = (await ds.query(`SELECT summary FROM audit_events`)) as { summary: string }[];
    expect(rows.map((r) => r.summary)).toEqual(["kept"]);
    await ds.destroy();
  });

  it("plain overlapping ds.transaction calls collide, which is why the queue exists", async () => {
    const ds = await openDatabase(":memory:");
    const raw = () =>
      ds.transaction(async (tx) => {
        await tx.query(`INSERT INTO audit_events (action, summary) VALUES ('study.created', 'x')`);
        await pause(10);
      });
    const results = await Promise.allSettled([raw(), raw()]);
    expect(results.some((r) => r.status === "rejected")).toBe(true);
    await ds.destroy().catch(() => undefined);
  });
});
