import net from "node:net";
import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import type { DataSource, QueryRunner } from "typeorm";
import type { PostgresDriver } from "typeorm/driver/postgres/PostgresDriver.js";
import { ENTITY_DRIVER } from "../../db/column-types.js";
import { openDatabase } from "../../db/data-source.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { openTestDatabase } from "../../test-support/test-database.js";
import { databaseProbe } from "./database-probe.js";

/** pg's pool counters, to show the pool really is exhausted (no timing involved). */
const poolOf = (ds: DataSource) =>
  (ds.driver as PostgresDriver).master as { totalCount: number; idleCount: number; waitingCount: number };

/**
 * A TCP relay in front of PostgreSQL that the test can cut (the database "stops": connections
 * reset, new ones refused), black-hole (connections accepted, nothing answered, as with a network
 * partition) or restore.
 */
async function relayTo(target: URL) {
  const sockets = new Set<net.Socket>();
  let mode: "relay" | "blackhole" = "relay";
  let swallowed = 0;
  const server = net.createServer((client) => {
    sockets.add(client);
    client.on("close", () => sockets.delete(client));
    client.on("error", () => undefined);
    if (mode === "blackhole") return void swallowed++;
    const upstream = net.connect(Number(target.port), target.hostname);
    sockets.add(upstream);
    upstream.on("close", () => sockets.delete(upstream));
    upstream.on("error", () => client.destroy());
    client.on("error", () => upstream.destroy());
    client.pipe(upstream).pipe(client);
  });
  const listen = (port = 0) =>
    new Promise<number>((resolve) =>
      server.listen(port, "127.0.0.1", () => resolve((server.address() as net.AddressInfo).port)),
    );
  const port = await listen();
  const cutAll = () => {
    for (const s of sockets) s.destroy();
  };
  return {
    port,
    /** Connections accepted and never answered. */
    swallowed: () => swallowed,
    stop: async () => {
      cutAll();
      await new Promise((resolve) => server.close(resolve));
    },
    start: async () => {
      mode = "relay";
      await listen(port);
    },
    blackhole: () => {
      mode = "blackhole";
      cutAll();
    },
    close: async () => {
      cutAll();
      if (server.listening) await new Promise((resolve) => server.close(resolve));
    },
  };
}

const cleanups: (() => Promise<unknown>)[] = [];
afterAll(async () => {
  for (const c of cleanups.reverse()) await c().catch(() => undefined);
});

describe.skipIf(ENTITY_DRIVER !== "postgres")(
  "readiness on PostgreSQL measures the database, not the pool",
  () => {
    it("answers 200 while every pooled connection is held in an open transaction", async () => {
      const t = await makeTestApp();
      const held: QueryRunner[] = [];
      const pool = poolOf(t.ds);
      try {
        // The test app's pool holds 4 connections (test-database.ts): take them all.
        for (let i = 0; i < 4; i++) {
          const qr = t.ds.createQueryRunner();
          await qr.connect();
          await qr.startTransaction();
          await qr.query("SELECT 1");
          held.push(qr);
        }
        const queued = t.ds.query("SELECT 2 AS n");
        expect(pool.totalCount).toBe(4);
        expect(pool.idleCount).toBe(0);
        expect(pool.waitingCount).toBe(1);

        const ready = await request(t.app).get("/api/ready").expect(200);
        expect(ready.body).toEqual({ status: "ready" });
        // Still saturated while readiness answered: the probe did not take a pooled connection.
        expect(pool.waitingCount).toBe(1);

        for (const qr of held.splice(0)) {
          await qr.rollbackTransaction();
          await qr.release();
        }
        expect(await queued).toEqual([{ n: 2 }]);
      } finally {
        for (const qr of held) await qr.release();
      }
    });

    it("is unready while the database is stopped or does not answer, and ready again once it is back", async () => {
      const { url } = await openTestDatabase();
      const target = new URL(url!);
      const relay = await relayTo(target);
      cleanups.push(relay.close);
      const viaRelay = new URL(target);
      viaRelay.hostname = "127.0.0.1";
      viaRelay.port = String(relay.port);
      const ds = await openDatabase({
        driver: "postgres",
        url: viaRelay.toString(),
        poolSize: 2,
        statementTimeoutMs: 0,
      });
      cleanups.push(() => ds.destroy());
      const probe = databaseProbe(ds);
      cleanups.push(() => probe.close());

      expect(await probe.answers()).toBe(true);
      // Its connection is its own, named so in pg_stat_activity.
      const names = (await ds.query(
        `SELECT application_name FROM pg_stat_activity WHERE datname = current_database() AND application_name = 'waymark-api-readiness'`,
      )) as unknown[];
      expect(names).toHaveLength(1);

      // The database stops: connections reset, new ones refused.
      await relay.stop();
      expect(await probe.answers()).toBe(false);
      expect(await probe.answers()).toBe(false);

      // Back: the probe reconnects by itself.
      await relay.start();
      expect(await probe.answers()).toBe(true);

      // Accepted but never answered (a partition). The first probe after the cut fails on its reset
      // connection; the next connects again, gets no answer and gives up at the 2 s limit. Two
      // probes at once share that one attempt.
      relay.blackhole();
      expect(await probe.answers()).toBe(false);
      const [a, b] = await Promise.all([probe.answers(), probe.answers()]);
      expect([a, b]).toEqual([false, false]);
      expect(relay.swallowed()).toBe(1);

      await relay.stop();
      await relay.start();
      expect(await probe.answers()).toBe(true);

      // Closed at shutdown: the connection goes away.
      await probe.close();
      const after = (await ds.query(
        `SELECT count(*)::int AS n FROM pg_stat_activity WHERE datname = current_database() AND application_name = 'waymark-api-readiness'`,
      )) as { n: number }[];
      expect(after[0]?.n).toBe(0);
    });
  },
);
