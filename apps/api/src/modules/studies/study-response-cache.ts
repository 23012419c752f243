import { createHash } from "node:crypto";
import { gzipSync } from "node:zlib";
import type { Request, Response } from "express";
import type { DataSource, EntityManager } from "typeorm";
import { isPostgres } from "../../db/driver.js";

/**
 * Serialized study responses kept in this process, keyed by the database's change marker
 * (`data_changes.version`, moved by triggers on every table the list and study page show; see
 * the 1764900000200 migration). The marker is read first on each request, so a write by this
 * instance, another instance or plain SQL is seen at once. What is stored is exactly the bytes of
 * what `studyDtos` produced; nothing here decides what a study looks like.
 */
export interface CachedResponse {
  body: Buffer;
  etag: string;
  /** the same bytes gzipped, made on the first request that accepts gzip */
  gzip?: Buffer;
  /** what an access check needs without reading the study again (the study page) */
  meta?: { ownerId: number; status: "draft" | "in_review" | "approved" };
  /** the key it is stored under, once stored */
  cacheKey?: string;
}

/** A least-recently-used map bounded by entry count and by bytes held. */
export class ResponseLru {
  private readonly entries = new Map<string, CachedResponse>();
  private bytes = 0;
  constructor(
    private readonly maxEntries: number,
    private readonly maxBytes: number,
  ) {}

  get(key: string): CachedResponse | undefined {
    const hit = this.entries.get(key);
    if (hit) {
      this.entries.delete(key);
      this.entries.set(key, hit);
    }
    return hit;
  }

  set(key: string, value: CachedResponse): void {
    this.delete(key);
    if (sizeOf(value) > this.maxBytes) return;
    this.entries.set(key, value);
    this.bytes += sizeOf(value);
    for (const [oldest] of this.entries) {
      if (this.entries.size <= this.maxEntries && this.bytes <= this.maxBytes) break;
      this.delete(oldest);
    }
  }

  /** Counts bytes added later to an entry (its gzip form), evicting others if that goes over. */
  grew(key: string, by: number): void {
    if (!this.entries.has(key)) return;
    this.bytes += by;
    for (const [oldest] of this.entries) {
      if (this.bytes <= this.maxBytes || oldest === key) break;
      this.delete(oldest);
    }
  }

  clear(): void {
    this.entries.clear();
    this.bytes = 0;
  }

  get size(): number {
    return this.entries.size;
  }

  private delete(key: string): void {
    const old = this.entries.get(key);
    if (!old) return;
    this.entries.delete(key);
    this.bytes -= sizeOf(old);
  }
}

const sizeOf = (v: CachedResponse) => v.body.length + (v.gzip?.length ?? 0);

/** The change marker as text (PostgreSQL answers a bigint as a string). */
export async function readChangeMarker(db: DataSource | EntityManager): Promise<string> {
  const rows: Array<{ version: number | string }> = await db.query(
    `SELECT "version" FROM "data_changes" WHERE "id" = 1`,
  );
  return String(rows[0]!.version);
}

export function serialize(value: unknown, meta?: CachedResponse["meta"]): CachedResponse {
  const body = Buffer.from(JSON.stringify(value));
  const etag = `W/"${createHash("sha1").update(body).digest("base64url")}"`;
  return meta ? { body, etag, meta } : { body, etag };
}

/** better-sqlite3's connection, as far as this file uses it. */
interface SqliteConnection {
  inTransaction: boolean;
  prepare(sql: string): { get(): { version: number; changes: number } };
}

interface Marker {
  version: string;
  /** SQLite: the connection's count of rows written, even by a transaction later rolled back */
  changes: number;
  /** SQLite: no transaction open on the connection, so reads see committed rows only */
  clean: boolean;
}

/**
 * One process's cache of study responses: `get` returns the entry for a key at the current
 * marker, or computes it and stores it under the marker read before computing.
 *
 * PostgreSQL: reads see committed rows only and the marker moves at commit (a deferred trigger),
 * so rows read after the marker are at least as new as it; an entry can only be newer than its key.
 * SQLite: better-sqlite3 gives TypeORM one connection, so a read may see another request's
 * uncommitted rows (and its uncommitted marker); a rollback would then leave them cached under a
 * marker value a later write reuses. An entry is stored only when no transaction was open when
 * the marker was read and no row was written on the connection while it was computed
 * (`total_changes()`); other processes' writes are invisible until committed.
 */
export class StudyResponseCache {
  readonly lru: ResponseLru;
  /** the newest marker seen; entries under older markers can never be asked for again */
  private newest = -1n;
  private readonly sqlite: {
    conn: SqliteConnection;
    read: () => { version: number; changes: number };
  } | null;

  constructor(
    private readonly ds: DataSource,
    limits: { entries: number; bytes: number } = { entries: 200, bytes: 50 * 1024 * 1024 },
  ) {
    this.lru = new ResponseLru(limits.entries, limits.bytes);
    if (isPostgres(ds)) this.sqlite = null;
    else {
      const conn = (ds.driver as unknown as { databaseConnection: SqliteConnection }).databaseConnection;
      const stmt = conn.prepare(
        `SELECT "version" AS version, total_changes() AS changes FROM "data_changes" WHERE "id" = 1`,
      );
      this.sqlite = { conn, read: () => stmt.get() };
    }
  }

  private async marker(): Promise<Marker> {
    if (!this.sqlite) return { version: await readChangeMarker(this.ds), changes: 0, clean: true };
    const clean = !this.sqlite.conn.inTransaction;
    const { version, changes } = this.sqlite.read();
    return { version: String(version), changes, clean };
  }

  /**
   * The cached response for `key` (everything the response depends on besides the data), else
   * `compute`'s, stored for the next request at the same marker.
   */
  async get(key: string, compute: () => Promise<CachedResponse>): Promise<CachedResponse> {
    const before = await this.marker();
    const cacheKey = `${key}@${before.version}`;
    const hit = this.lru.get(cacheKey);
    if (hit) return hit;
    const entry = await compute();
    if (this.sqlite) {
      const after = await this.marker();
      if (!before.clean || !after.clean || after.changes !== before.changes) return entry;
    }
    const n = BigInt(before.version);
    if (n > this.newest) {
      this.newest = n;
      this.lru.clear();
    }
    if (n === this.newest) {
      entry.cacheKey = cacheKey;
      this.lru.set(cacheKey, entry);
    }
    return entry;
  }

  /** Sends an entry: 304 when the client holds it, else the stored bytes (gzipped if asked). */
  send(req: Request, res: Response, entry: CachedResponse): void {
    res.setHeader("ETag", entry.etag);
    res.setHeader("Vary", "Accept-Encoding");
    if (req.fresh) {
      res.status(304).end();
      return;
    }
    res.setHeader("Content-Type", "application/json; charset=utf-8");
    let body = entry.body;
    // Above the compression middleware's threshold, gzip once per entry rather than per request.
    if (body.length >= 8 * 1024 && req.acceptsEncodings("gzip", "identity") === "gzip") {
      if (!entry.gzip) {
        entry.gzip = gzipSync(body);
        if (entry.cacheKey) this.lru.grew(entry.cacheKey, entry.gzip.length);
      }
      body = entry.gzip;
      res.setHeader("Content-Encoding", "gzip");
    }
    res.setHeader("Content-Length", body.length);
    res.end(body);
  }
}
