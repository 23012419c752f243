import { createHash } from "node:crypto";
import type { ClientRateLimitInfo, Options, Store } from "express-rate-limit";
import type { DataSource } from "typeorm";
import { readDate, runSql } from "../db/run-sql.js";

interface Counter {
  hits: number | string;
  reset_at: unknown;
}

/** Keys are user input (the e-mail field): long ones are stored as a hash so the row stays small. */
const MAX_KEY_LENGTH = 200;

/**
 * An express-rate-limit store kept in the `sign_in_throttle` table, so every API instance on the
 * database counts against the same numbers. Each change is one statement, so concurrent requests
 * on any number of processes never lose a count: the increment is an
 * `INSERT … ON CONFLICT … DO UPDATE … RETURNING` (SQLite ≥ 3.35 and PostgreSQL), which also starts
 * a new window when the stored one has ended.
 */
export class DatabaseRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = 15 * 60 * 1000;

  constructor(
    private readonly ds: DataSource,
    /** Keeps limiters sharing the table apart ("ip", "account"). */
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private key(key: string): string {
    const full = `${this.prefix}:${key}`;
    return full.length <= MAX_KEY_LENGTH
      ? full
      : `${this.prefix}:sha256:${createHash("sha256").update(key).digest("hex")}`;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const { rows } = await runSql<Counter>(
      this.ds,
      `SELECT "hits", "reset_at" FROM "sign_in_throttle" WHERE "key" = :key AND "reset_at" > :now`,
      { key: this.key(key), now: new Date() },
    );
    const row = rows[0];
    return row ? { totalHits: Number(row.hits), resetTime: readDate(row.reset_at) } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const now = new Date();
    const { rows } = await runSql<Counter>(
      this.ds,
      `INSERT INTO "sign_in_throttle" ("key", "hits", "reset_at") VALUES (:key, 1, :resetAt)
       ON CONFLICT ("key") DO UPDATE SET
         "hits" = CASE WHEN "sign_in_throttle"."reset_at" <= :now THEN 1 ELSE "sign_in_throttle"."hits" + 1 END,
         "reset_at" = CASE WHEN "sign_in_throttle"."reset_at" <= :now THEN :resetAt ELSE "sign_in_throttle"."reset_at" END
       RETURNING "hits", "reset_at"`,
      { key: this.key(key), now, resetAt: new Date(now.getTime() + this.windowMs) },
    );
    const row = rows[0]!;
    return { totalHits: Number(row.hits), resetTime: readDate(row.reset_at) };
  }

  /** Takes back a hit (a sign-in that succeeded), never below zero and never in an ended window. */
  async decrement(key: string): Promise<void> {
    await runSql(
      this.ds,
      `UPDATE "sign_in_throttle" SET "hits" = "hits" - 1 WHERE "key" = :key AND "hits" > 0 AND "reset_at" > :now`,
      { key: this.key(key), now: new Date() },
    );
  }

  async resetKey(key: string): Promise<void> {
    await runSql(this.ds, `DELETE FROM "sign_in_throttle" WHERE "key" = :key`, { key: this.key(key) });
  }
}

/** Drops counters whose window has ended (they would be reset on their next hit anyway). */
export async function pruneSignInThrottle(ds: DataSource): Promise<void> {
  await runSql(ds, `DELETE FROM "sign_in_throttle" WHERE "reset_at" <= :now`, { now: new Date() });
}
