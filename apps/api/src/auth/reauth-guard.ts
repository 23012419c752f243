import type { Options } from "express-rate-limit";
import type { DataSource } from "typeorm";
import { DatabaseRateLimitStore } from "./sign-in-throttle-store.js";
import type { Actor } from "../http/actor.js";
import { HttpError } from "../http/errors.js";
import { recordAudit } from "../modules/audit/audit.service.js";

/** Failed password re-entries allowed per account in the window (common practice, as for sign-in). */
export const REAUTH_LIMIT = 5;
const WINDOW_MS = 15 * 60 * 1000;

/** The counters live in the sign-in throttle table (under "reauth:"), shared by every instance. */
const stores = new WeakMap<DataSource, DatabaseRateLimitStore>();
function storeFor(ds: DataSource): DatabaseRateLimitStore {
  let store = stores.get(ds);
  if (!store) {
    store = new DatabaseRateLimitStore(ds, "reauth");
    store.init({ windowMs: WINDOW_MS } as Options);
    stores.set(ds, store);
  }
  return store;
}

/**
 * Re-entering one's password (to change it, or to sign an approval) is a second way to guess it,
 * so it is throttled per account like sign-in and every failure is audited. Call `check` before
 * verifying, then `failed` or `succeeded`. Failures count in a window of 15 minutes from the first;
 * the counters are in the database, so a guess on one instance counts on all.
 */
export const reauth = {
  async check(ds: DataSource, actor: Actor, what: string): Promise<void> {
    const counted = await storeFor(ds).get(String(actor.user.id));
    if (counted && counted.totalHits >= REAUTH_LIMIT) {
      const resetAt = counted.resetTime?.getTime() ?? Date.now() + WINDOW_MS;
      const minutes = Math.max(1, Math.ceil((resetAt - Date.now()) / 60_000));
      throw new HttpError(
        429,
        "too_many_attempts",
        `Too many wrong passwords for ${what}. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`,
      );
    }
  },
  async failed(ds: DataSource, actor: Actor, what: string, studyId?: number): Promise<void> {
    await storeFor(ds).increment(String(actor.user.id));
    await recordAudit(ds, actor, {
      action: "auth.reauth-failed",
      studyId,
      summary: `Wrong password entered for ${what}`,
    });
  },
  async succeeded(ds: DataSource, actor: Actor): Promise<void> {
    await storeFor(ds).resetKey(String(actor.user.id));
  },
};
