import session from "express-session";
import { Brackets, type DataSource, type Repository } from "typeorm";
import { Session } from "./session.entity.js";

const DAY_MS = 24 * 60 * 60 * 1000;
/** A rolling session is rewritten at most this often: writing it on every request costs a write per read. */
const TOUCH_INTERVAL_MS = 60_000;
/**
 * How long an ended session's id is remembered. A request still in flight on it (an upload may
 * trickle for minutes) must not write it back when it finishes; a day is far past any request.
 */
const TOMBSTONE_MS = DAY_MS;

/**
 * express-session store on TypeORM. Written here because the maintained stores either target
 * TypeORM 0.3 or carry a copyleft licence. Keeps the user id in a column so all of a user's
 * sessions can be ended at once (deactivation, password change).
 *
 * An ended session stays as a tombstone row: `expires_at` holds minus the time it may be pruned,
 * so it reads as expired, and no write touches a row whose `expires_at` is negative. Writes are
 * conditional updates, and a new row is inserted only when the id was never used — so a request
 * that finishes after sign-out or a password change cannot bring its session back.
 */
export class TypeormSessionStore extends session.Store {
  private readonly repo: Repository<Session>;
  private readonly lastTouch = new Map<string, number>();

  constructor(dataSource: DataSource) {
    super();
    this.repo = dataSource.getRepository(Session);
  }

  override get(sid: string, cb: (err: unknown, s?: session.SessionData | null) => void): void {
    this.repo
      .findOneBy({ sid })
      .then((row) => {
        if (!row || Number(row.expiresAt) <= Date.now()) return cb(null, null);
        cb(null, JSON.parse(row.data) as session.SessionData);
      })
      .catch(cb);
  }

  override set(sid: string, s: session.SessionData, cb?: (err?: unknown) => void): void {
    const expiresAt = s.cookie?.expires ? new Date(s.cookie.expires).getTime() : Date.now() + DAY_MS;
    const userId = (s as { passport?: { user?: number } }).passport?.user ?? null;
    const data = JSON.stringify(s);
    // This write sets the expiry: a touch within the interval has nothing to add.
    this.lastTouch.set(sid, Date.now());
    this.updateLive(sid, { data, expiresAt, userId })
      .then(async (updated) => {
        // Insert only an id never seen: a tombstone makes the insert a no-op.
        if (!updated)
          await this.repo
            .createQueryBuilder()
            .insert()
            .into(Session)
            .values({ sid, data, expiresAt, userId })
            .orIgnore()
            .execute();
        cb?.();
      })
      .catch((e) => cb?.(e));
  }

  override destroy(sid: string, cb?: (err?: unknown) => void): void {
    this.lastTouch.delete(sid);
    const tombstone = { sid, data: "{}", expiresAt: -(Date.now() + TOMBSTONE_MS), userId: null };
    this.repo
      .createQueryBuilder()
      .insert()
      .into(Session)
      .values(tombstone)
      .orUpdate(["data", "expires_at", "user_id"], ["sid"])
      .execute()
      .then(() => cb?.())
      .catch((e) => cb?.(e));
  }

  override touch(sid: string, s: session.SessionData, cb?: (err?: unknown) => void): void {
    const now = Date.now();
    if (now - (this.lastTouch.get(sid) ?? 0) < TOUCH_INTERVAL_MS) return cb?.();
    this.lastTouch.set(sid, now);
    if (this.lastTouch.size > 10_000) this.lastTouch.clear();
    const expiresAt = s.cookie?.expires ? new Date(s.cookie.expires).getTime() : now + DAY_MS;
    // A touch only extends a live session; it never creates or revives one.
    this.updateLive(sid, { expiresAt })
      .then(() => cb?.())
      .catch((e) => cb?.(e));
  }

  /** Updates the row only while it is a live session; true when it did. */
  private async updateLive(sid: string, values: Partial<Session>): Promise<boolean> {
    const result = await this.repo
      .createQueryBuilder()
      .update(Session)
      .set(values)
      .where("sid = :sid AND expires_at >= 0", { sid })
      .execute();
    return (result.affected ?? 0) > 0;
  }

  /** Ends every session of one user, leaving tombstones. */
  async destroyForUser(userId: number): Promise<void> {
    await this.repo
      .createQueryBuilder()
      .update(Session)
      .set({ data: "{}", expiresAt: -(Date.now() + TOMBSTONE_MS), userId: null })
      .where("user_id = :userId", { userId })
      .execute();
  }

  /** Removes expired sessions and tombstones past their time; called on a timer by the server. */
  async prune(): Promise<void> {
    const now = Date.now();
    await this.repo
      .createQueryBuilder()
      .delete()
      .from(Session)
      .where(
        new Brackets((q) =>
          q
            .where("expires_at >= 0 AND expires_at < :now", { now })
            .orWhere("expires_at < 0 AND expires_at > :negNow", { negNow: -now }),
        ),
      )
      .execute();
  }
}
