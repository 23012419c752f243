import http from "node:http";
import net from "node:net";
import { afterAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "../config/env.js";
import { startApi, type ApiProcess } from "../test-support/api-process.js";
import { openSharedDatabase } from "../test-support/shared-database.js";

/**
 * SIGTERM to a real server process: readiness turns 503 at once while liveness stays 200; after
 * the configured delay new connections are refused; a request already in flight still completes;
 * the process exits 0.
 */
const TIMEOUT = 120_000;
let api: ApiProcess | undefined;
let shared: Awaited<ReturnType<typeof openSharedDatabase>> | undefined;

afterAll(async () => {
  await api?.kill();
  await shared?.close();
});

/** One request on a connection of its own; resolves with the status and body. */
function get(url: string): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    http
      .get(url, { agent: false }, (res) => {
        let body = "";
        res.on("data", (c: Buffer) => (body += c.toString()));
        res.on("end", () => resolve({ status: res.statusCode ?? 0, body }));
      })
      .on("error", reject);
  });
}

/** Whether a TCP connection to the port is accepted right now. */
function accepts(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const s = net.connect(port, "127.0.0.1");
    s.once("connect", () => (s.destroy(), resolve(true)));
    s.once("error", () => resolve(false));
  });
}

describe("graceful shutdown of a real server process", () => {
  it(
    "on SIGTERM: readiness 503, new connections refused after the delay, the request in flight completes, exit 0",
    async () => {
      // A SQLite file or a PostgreSQL database, as the suite runs.
      shared = await openSharedDatabase();
      api = await startApi(shared.target, 60_000, {
        SHUTDOWN_DELAY_SECONDS: "1",
        SHUTDOWN_GRACE_SECONDS: "20",
      });
      const port = Number(new URL(api.url).port);
      expect((await get(`${api.url}/api/ready`)).status).toBe(200);

      // A sign-in whose body is only half sent: the server has the request and waits for the rest.
      const csrf = await new Promise<{ token: string; cookie: string }>((resolve, reject) => {
        http
          .get(`${api!.url}/api/auth/csrf`, { agent: false }, (res) => {
            let body = "";
            res.on("data", (c: Buffer) => (body += c.toString()));
            res.on("end", () =>
              resolve({
                token: (JSON.parse(body) as { token: string }).token,
                cookie: (res.headers["set-cookie"] ?? []).map((c) => c.split(";")[0]).join("; "),
              }),
            );
          })
          .on("error", reject);
      });
      const body = JSON.stringify({ email: "analyst@waymark.test", password: DEMO_PASSWORD });
      const slow = http.request(`${api.url}/api/auth/login`, {
        method: "POST",
        agent: false,
        headers: {
          "content-type": "application/json",
          "content-length": String(Buffer.byteLength(body)),
          cookie: csrf.cookie,
          "x-csrf-token": csrf.token,
        },
      });
      const answer = new Promise<{ status: number; connection?: string }>((resolve, reject) => {
        slow.on("response", (res) => {
          res.resume();
          res.on("end", () => resolve({ status: res.statusCode ?? 0, connection: res.headers.connection }));
        });
        slow.on("error", reject);
      });
      slow.write(body.slice(0, 10));
      await new Promise((r) => setTimeout(r, 300));

      const exited = new Promise<number | null>((resolve) =>
        api!.child.once("exit", (code) => resolve(code)),
      );
      api.child.kill("SIGTERM");
      // The drain begins at once: poll until readiness says so (the signal is handled asynchronously).
      let ready = await get(`${api.url}/api/ready`);
      for (let i = 0; i < 20 && ready.status === 200; i++) {
        await new Promise((r) => setTimeout(r, 20));
        ready = await get(`${api.url}/api/ready`);
      }
      expect(ready.status).toBe(503);
      expect(JSON.parse(ready.body).error.code).toBe("draining");
      expect((await get(`${api.url}/api/health`)).status).toBe(200);

      // After the one-second delay the listener is closed.
      let open = true;
      for (let i = 0; i < 50 && open; i++) {
        open = await accepts(port);
        if (open) await new Promise((r) => setTimeout(r, 100));
      }
      expect(open).toBe(false);

      // The request in flight is still served, and told not to keep its connection.
      slow.end(body.slice(10));
      expect(await answer).toEqual({ status: 200, connection: "close" });
      expect(await exited).toBe(0);
      expect(api.output()).toMatch(/SIGTERM received: draining[\s\S]*Shutdown complete/);
    },
    TIMEOUT,
  );
});
