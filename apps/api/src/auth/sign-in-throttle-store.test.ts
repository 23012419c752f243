import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { fileURLToPath } from "node:url";
import type { Options } from "express-rate-limit";
import type { DataSource } from "typeorm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openSharedDatabase } from "../test-support/shared-database.js";
import { DatabaseRateLimitStore, pruneSignInThrottle } from "./sign-in-throttle-store.js";

const apiRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const storeWith = (ds: DataSource, prefix: string, windowMs: number) => {
  const s = new DatabaseRateLimitStore(ds, prefix);
  s.init({ windowMs } as Options);
  return s;
};
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

let shared: Awaited<ReturnType<typeof openSharedDatabase>>;
let ds: DataSource;

beforeAll(async () => {
  shared = await openSharedDatabase();
  ds = await shared.connect();
});
afterAll(() => shared.close());

describe("the database-backed rate-limit store", () => {
  it("counts hits within a window, and starts a new window once the stored one has ended", async () => {
    const store = storeWith(ds, "window", 300);
    const t0 = Date.now();
    const first = await store.increment("a");
    expect(first.totalHits).toBe(1);
    // The window ends windowMs after the first hit (the stored datetime keeps milliseconds).
    expect(Math.abs(first.resetTime!.getTime() - (t0 + 300))).toBeLessThan(100);
    expect((await store.increment("a")).totalHits).toBe(2);
    expect((await store.get("a"))?.totalHits).toBe(2);
    await sleep(350);
    expect(await store.get("a")).toBeUndefined();
    const renewed = await store.increment("a");
    expect(renewed.totalHits).toBe(1);
    expect(renewed.resetTime!.getTime()).toBeGreaterThan(first.resetTime!.getTime());
  });

  it("takes a hit back without going below zero, resets a key, and keeps prefixes apart", async () => {
    const ip = storeWith(ds, "ip", 60_000);
    const account = storeWith(ds, "account", 60_000);
    await ip.increment("same");
    await ip.increment("same");
    await account.increment("same");
    await ip.decrement("same");
    expect((await ip.get("same"))?.totalHits).toBe(1);
    await ip.decrement("same");
    await ip.decrement("same");
    expect((await ip.get("same"))?.totalHits).toBe(0);
    expect((await account.get("same"))?.totalHits).toBe(1);
    await account.resetKey("same");
    expect(await account.get("same")).toBeUndefined();
    expect((await account.increment("same")).totalHits).toBe(1);
  });

  it("stores an over-long key (user input) as a hash, still counting it as one key", async () => {
    const store = storeWith(ds, "account", 60_000);
    const long = `${"x".repeat(5000)}@waymark.test`;
    await store.increment(long);
    expect((await store.increment(long)).totalHits).toBe(2);
    const keys = (await ds.query(
      `SELECT "key" FROM "sign_in_throttle" WHERE "key" LIKE 'account:sha256:%'`,
    )) as {
      key: string;
    }[];
    expect(keys.map((k) => k.key.length)).toEqual(["account:sha256:".length + 64]);
  });

  it("prunes only counters whose window has ended", async () => {
    await storeWith(ds, "prune", 1).increment("gone");
    await storeWith(ds, "prune", 60_000).increment("kept");
    await sleep(20);
    await pruneSignInThrottle(ds);
    const keys = (await ds.query(`SELECT "key" FROM "sign_in_throttle" WHERE "key" LIKE 'prune:%'`)) as {
      key: string;
    }[];
    expect(keys.map((k) => k.key)).toEqual(["prune:kept"]);
  });

  it("loses no count when three processes increment one key at the same time", async () => {
    const run = promisify(execFile);
    const each = 40;
    await Promise.all(
      [1, 2, 3].map(() =>
        run(
          process.execPath,
          [
            "--import",
            "tsx",
            "src/auth/test-fixtures/count-failures.ts",
            shared.target,
            "shared",
            String(each),
          ],
          { cwd: apiRoot },
        ),
      ),
    );
    const store = storeWith(ds, "test", 60_000);
    expect((await store.get("shared"))?.totalHits).toBe(3 * each);
  }, 60_000);
});
