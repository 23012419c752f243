// The API beside a bare Express app serving the same bytes (`npm run bench -w @waymark/api`, after
// the build). Starts the built API on a fresh demo database, adds studies until the demo analyst
// has 50, then for GET /api/health, /api/studies, /api/studies/:id and one stored analysis:
// the serial median latency (one keep-alive connection, client time included, as for the bare
// app) and the throughput at 50 connections (autocannon), each as a ratio to the bare app. The
// API gets the analyst's session cookie and no Accept-Encoding, so both send the same bytes.
// Also the median import time of the compiled app.js. Prints the figures (nothing is asserted)
// and writes bench/results/api-compare.json.
import { execFileSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import http from "node:http";
import os from "node:os";
import path from "node:path";
import autocannon from "autocannon";
import express from "express";
import { DEMO_ANALYST, freePort, repoRoot, signIn, startApi } from "./start-api.mjs";

const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);
const SERIAL = Number(process.env.BENCH_SERIAL ?? 400);
const STUDIES = 50;
const IMPORT_RUNS = 5;
const GOALS = {
  studiesThroughputRatio: "≥ 0.40",
  studiesSerialMs: "≤ 3",
  healthSerialMs: "≤ 1.5",
  importS: "≤ 1.5",
  errors: 0,
};

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const round = (x, d = 2) => Math.round(x * 10 ** d) / 10 ** d;

/** Median milliseconds of `n` GETs one after another on one kept-alive connection. */
async function serialMedian(url, headers, n) {
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  const once = () =>
    new Promise((resolve, reject) => {
      const t0 = performance.now();
      http
        .get(url, { agent, headers }, (res) => {
          res.resume();
          res.on("end", () =>
            res.statusCode === 200
              ? resolve(performance.now() - t0)
              : reject(new Error(`${url} → ${res.statusCode}`)),
          );
        })
        .on("error", reject);
    });
  for (let i = 0; i < 50; i++) await once(); // warm-up
  const times = [];
  for (let i = 0; i < n; i++) times.push(await once());
  agent.destroy();
  return median(times);
}

/** Requests per second at CONNECTIONS connections, with errors and non-2xx answers. */
async function throughput(url, headers) {
  const r = await autocannon({ url, connections: CONNECTIONS, duration: DURATION_S, headers });
  return {
    perSecond: Math.round(r.requests.average),
    p99Ms: r.latency.p99,
    errors: r.errors + r.timeouts,
    non2xx: r.non2xx,
  };
}

/** Median seconds to import the compiled app.js in a fresh node process. */
function importSeconds() {
  const appJs = path.join(repoRoot, "apps/api/dist/app.js");
  const code = `const t=performance.now();await import(${JSON.stringify(appJs)});console.log((performance.now()-t)/1000)`;
  const runs = [];
  for (let i = 0; i < IMPORT_RUNS; i++)
    runs.push(
      Number(execFileSync(process.execPath, ["--input-type=module", "-e", code], { encoding: "utf8" })),
    );
  return { medianS: round(median(runs), 3), runsS: runs.map((x) => round(x, 3)) };
}

const imported = importSeconds();
console.log(`import of dist/app.js: median ${imported.medianS} s (${imported.runsS.join(", ")})`);

const api = await startApi();
let bare;
try {
  const session = await signIn(api.baseUrl, DEMO_ANALYST);
  const auth = { cookie: session.cookie };
  const get = async (p) => {
    const res = await fetch(api.baseUrl + p, { headers: { ...auth, "accept-encoding": "identity" } });
    if (!res.ok) throw new Error(`GET ${p} → ${res.status}`);
    return { type: res.headers.get("content-type"), bytes: Buffer.from(await res.arrayBuffer()) };
  };

  // Up to 50 studies for the demo analyst (the demo seeds three, each with a stored analysis).
  const have = JSON.parse((await get("/api/studies")).bytes).studies;
  for (let i = have.length; i < STUDIES; i++) {
    const res = await fetch(`${api.baseUrl}/api/studies`, {
      method: "POST",
      headers: { ...auth, "content-type": "application/json", "x-csrf-token": session.csrfToken },
      body: JSON.stringify({
        title: `Bench study ${i + 1}`,
        objective: "Invented study for the API benchmark.",
        outcomeName: "Yield",
        outcomeUnit: "g",
        factorName: "Line",
        levels: ["North", "South", "East"],
        controlLevel: null,
        context: "general",
      }),
    });
    if (res.status !== 201) throw new Error(`POST /api/studies → ${res.status}: ${await res.text()}`);
  }
  const studies = JSON.parse((await get("/api/studies")).bytes).studies;
  const analysed = studies.find((s) => s.latestAnalysisId);
  if (!analysed) throw new Error("no demo study has a stored analysis");

  const routes = [
    { name: "GET /api/health", path: "/api/health", headers: {} },
    { name: `GET /api/studies (${studies.length} studies)`, path: "/api/studies", headers: auth },
    { name: "GET /api/studies/:id", path: `/api/studies/${analysed.id}`, headers: auth },
    {
      name: "GET /api/studies/:id/analyses/:id",
      path: `/api/studies/${analysed.id}/analyses/${analysed.latestAnalysisId}`,
      headers: auth,
    },
  ];

  // The bare app: the same status, content type and bytes for each path, nothing else.
  const app = express();
  for (const r of routes) {
    const { type, bytes } = await get(r.path);
    r.bytes = bytes.length;
    app.get(r.path, (_req, res) => res.type(type).send(bytes));
  }
  const port = await freePort();
  bare = await new Promise((resolve) => {
    const s = app.listen(port, "127.0.0.1", () => resolve(s));
  });
  const bareUrl = `http://127.0.0.1:${port}`;

  const results = [];
  for (const r of routes) {
    const row = {
      route: r.name,
      bytes: r.bytes,
      serialMedianMs: {
        api: round(await serialMedian(api.baseUrl + r.path, r.headers, SERIAL)),
        bare: round(await serialMedian(bareUrl + r.path, {}, SERIAL)),
      },
      at50: {
        api: await throughput(api.baseUrl + r.path, r.headers),
        bare: await throughput(bareUrl + r.path, {}),
      },
    };
    row.throughputRatio = round(row.at50.api.perSecond / row.at50.bare.perSecond);
    row.serialRatio = round(row.serialMedianMs.api / row.serialMedianMs.bare);
    results.push(row);
    console.log(
      `${r.name.padEnd(36)} ${String(r.bytes).padStart(7)} B  serial median ${row.serialMedianMs.api} ms ` +
        `(bare ${row.serialMedianMs.bare} ms)  at ${CONNECTIONS} connections ${row.at50.api.perSecond} req/s ` +
        `(bare ${row.at50.bare.perSecond}) = ${Math.round(row.throughputRatio * 100)}% of bare, p99 ` +
        `${row.at50.api.p99Ms} ms, errors ${row.at50.api.errors}, non-2xx ${row.at50.api.non2xx}`,
    );
  }

  const out = {
    date: new Date().toISOString(),
    machine: {
      node: process.version,
      cpus: os.cpus().length,
      loadAverage: os.loadavg().map((x) => round(x)),
      note: "shared 2-core machine; client, API and bare app on the same cores; figures vary with load",
    },
    method: {
      serial: `${SERIAL} GETs one after another on one kept-alive connection after 50 warm-up GETs; median, client time included`,
      load: `autocannon, ${CONNECTIONS} connections, ${DURATION_S} s per route and app`,
      headers: "the API gets the demo analyst's session cookie (not on /api/health) and no Accept-Encoding",
    },
    importAppJs: imported,
    routes: results,
    goals: GOALS,
  };
  const dir = path.join(repoRoot, "bench/results");
  mkdirSync(dir, { recursive: true });
  writeFileSync(path.join(dir, "api-compare.json"), JSON.stringify(out, null, 2) + "\n");
} finally {
  bare?.close();
  await api.stop();
}
