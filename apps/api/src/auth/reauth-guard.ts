import type { DataSource } from "typeorm";
import type { Actor } from "../http/actor.js";
import { HttpError } from "../http/errors.js";
import { recordAudit } from "../modules/audit/audit.service.js";

/** Failed password re-entries allowed per account in the window (common practice, as for sign-in). */
export const REAUTH_LIMIT = 5;
const WINDOW_MS = 15 * 60 * 1000;

/** Recent failures per user, per database (test apps in one process keep apart). */
const failures = new WeakMap<DataSource, Map<number, number[]>>();

function recent(ds: DataSource, userId: number): number[] {
  let byUser = failures.get(ds);
  if (!byUser) failures.set(ds, (byUser = new Map()));
  const now = Date.now();
  const list = (byUser.get(userId) ?? []).filter((t) => now - t < WINDOW_MS);
  byUser.set(userId, list);
  return list;
}

/**
 * Re-entering one's password (to change it, or to sign an approval) is a second way to guess it,
 * so it is throttled per account like sign-in and every failure is audited. Call `check` before
 * verifying, then `failed` or `succeeded`. Counters live in process memory.
 */
export const reauth = {
  check(ds: DataSource, actor: Actor, what: string): void {
    const list = recent(ds, actor.user.id);
    if (list.length >= REAUTH_LIMIT) {
      const minutes = Math.max(1, Math.ceil((list[0]! + WINDOW_MS - Date.now()) / 60_000));
      throw new HttpError(
        429,
        "too_many_attempts",
        `Too many wrong passwords for ${what}. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`,
      );
    }
  },
  async failed(ds: DataSource, actor: Actor, what: string, studyId?: number): Promise<void> {
    recent(ds, actor.user.id).push(Date.now());
    await recordAudit(ds, actor, {
      action: "auth.reauth-failed",
      studyId,
      summary: `Wrong password entered for ${what}`,
    });
  },
  succeeded(ds: DataSource, actor: Actor): void {
    failures.get(ds)?.delete(actor.user.id);
  },
};
