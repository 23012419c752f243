import session from "express-session";
import { LessThan, type DataSource, type Repository } from "typeorm";
import { Session } from "./session.entity.js";

const DAY_MS = 24 * 60 * 60 * 1000;
/** A rolling session is rewritten at most this often: writing it on every request costs a write per read. */
const TOUCH_INTERVAL_MS = 60_000;

/**
 * express-session store on TypeORM. Written here because the maintained stores either target
 * TypeORM 0.3 or carry a copyleft licence. Keeps the user id in a column so all of a user's
 * sessions can be ended at once (deactivation, password change).
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
    const expires = s.cookie?.expires ? new Date(s.cookie.expires).getTime() : Date.now() + DAY_MS;
    const userId = (s as { passport?: { user?: number } }).passport?.user ?? null;
    this.repo
      .save({ sid, data: JSON.stringify(s), expiresAt: expires, userId })
      .then(() => {
        cb?.();
      })
      .catch((e) => cb?.(e));
  }

  override destroy(sid: string, cb?: (err?: unknown) => void): void {
    this.lastTouch.delete(sid);
    this.repo
      .delete({ sid })
      .then(() => cb?.())
      .catch((e) => cb?.(e));
  }

  override touch(sid: string, s: session.SessionData, cb?: (err?: unknown) => void): void {
    const now = Date.now();
    if (now - (this.lastTouch.get(sid) ?? 0) < TOUCH_INTERVAL_MS) return cb?.();
    this.lastTouch.set(sid, now);
    if (this.lastTouch.size > 10_000) this.lastTouch.clear();
    this.set(sid, s, cb);
  }

  /** Ends every session of one user. */
  async destroyForUser(userId: number): Promise<void> {
    await this.repo.delete({ userId });
  }

  /** Removes expired rows; called on a timer by the server. */
  async prune(): Promise<void> {
    await this.repo.delete({ expiresAt: LessThan(Date.now()) });
  }
}
