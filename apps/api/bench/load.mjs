// Load benchmark of the API (`npm run bench -w @waymark/api`, after the build).
// Starts the built API on a free loopback port with a fresh demo database, signs in 50
// clients as the demo analyst (each its own session cookie and CSRF token), then runs
// autocannon with 50 connections for 30 s. Every connection loops over the three demo
// studies: GET /api/studies, GET /api/studies/:id, GET /api/studies/:id/analyses/:analysisId
// for each study, then one POST /api/studies/:id/analyses (a real analysis run), so one
// request in ten is an analysis run. Latency per kind (read / analysis run) comes from each
// response's own time, matched to its request through autocannon's onResponse hook.
// Prints the figures against the budget (not asserted) and writes bench/results/load.json.
import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import autocannon from "autocannon";
import { DEMO_ANALYST, repoRoot, signIn, startApi } from "./start-api.mjs";

const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 30);
const BUDGET = { readP95Ms: 50, errors: 0 };

const percentile = (sorted, p) => {
  if (sorted.length === 0) return null;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i];
};
const round = (x, d = 1) => (x === null ? null : Math.round(x * 10 ** d) / 10 ** d);

function summarize(samples) {
  const lat = samples.map((s) => s.ms).sort((a, b) => a - b);
  const non2xx = samples.filter((s) => s.status < 200 || s.status > 299).length;
  const byStatus = {};
  for (const s of samples) byStatus[s.status] = (byStatus[s.status] ?? 0) + 1;
  return {
    requests: samples.length,
    perSecond: round(samples.length / DURATION_S),
    latencyMs: {
      p50: round(percentile(lat, 50)),
      p95: round(percentile(lat, 95)),
      p99: round(percentile(lat, 99)),
      max: round(lat.at(-1) ?? null),
      mean: round(lat.reduce((a, b) => a + b, 0) / (lat.length || 1)),
    },
    non2xx,
    byStatus,
  };
}

const serverLogCopy = path.join(repoRoot, "bench", "tmp", "api-load-server.log");
const api = await startApi();
let exitCode = 0;
try {
  // 50 sessions of the demo analyst, who owns every demo study.
  const t0 = performance.now();
  const sessions = [];
  for (let i = 0; i < CONNECTIONS; i++) sessions.push(await signIn(api.baseUrl, DEMO_ANALYST));
  const signInMs = (performance.now() - t0) / CONNECTIONS;

  const probe = { cookie: sessions[0].cookie };
  const list = await (await fetch(`${api.baseUrl}/api/studies`, { headers: probe })).json();
  const studies = [];
  for (const { id } of list.studies) {
    const { study } = await (await fetch(`${api.baseUrl}/api/studies/${id}`, { headers: probe })).json();
    // The draft demo study (plan still open) has no data yet; the load runs on the others.
    if (!study.latestDataset || !study.latestAnalysisId) continue;
    studies.push({
      id,
      datasetId: study.latestDataset.id,
      analysisId: study.latestAnalysisId,
      draft: study.status === "draft",
    });
  }
  if (studies.length === 0) throw new Error("No demo study with data and an analysis was seeded");
  const drafts = studies.filter((s) => s.draft);
  if (drafts.length === 0) throw new Error("No draft demo study with data to run analyses on");
  console.log(
    `Signed in ${sessions.length} sessions (${round(signInMs, 0)} ms each, bcrypt); studies ${studies
      .map((s) => `#${s.id} (dataset ${s.datasetId}, analysis ${s.analysisId})`)
      .join(", ")}`,
  );

  // Samples: one { kind, ms, status } per response, in order.
  const samples = [];
  const errorBodies = new Set();
  const requestsFor = (session, state) => {
    const headers = { cookie: session.cookie, accept: "application/json" };
    const tag = (kind) => (status, body) => {
      state.pending.push(kind);
      if ((status < 200 || status > 299) && errorBodies.size < 5)
        errorBodies.add(`${kind} ${status} ${String(body).slice(0, 300)}`);
    };
    const reqs = [];
    for (const s of studies) {
      reqs.push({ method: "GET", path: "/api/studies", headers, onResponse: tag("read:list") });
      reqs.push({ method: "GET", path: `/api/studies/${s.id}`, headers, onResponse: tag("read:study") });
      reqs.push({
        method: "GET",
        path: `/api/studies/${s.id}/analyses/${s.analysisId}`,
        headers,
        onResponse: tag("read:analysis"),
      });
    }
    // One analysis run per loop, on a draft study (a study in review or approved refuses new runs
    // with 409, as it should), chosen by the connection.
    const s = drafts[state.index % drafts.length];
    reqs.push({
      method: "POST",
      path: `/api/studies/${s.id}/analyses`,
      headers: { ...headers, "content-type": "application/json", "x-csrf-token": session.csrfToken },
      body: JSON.stringify({ datasetId: s.datasetId }),
      onResponse: tag("run"),
    });
    return reqs;
  };

  let clientCount = 0;
  const instance = autocannon({
    url: api.baseUrl,
    connections: CONNECTIONS,
    duration: DURATION_S,
    timeout: 10,
    // Placeholder; every client replaces it with its own session's requests below.
    requests: [{ method: "GET", path: "/api/health" }],
    setupClient: (client) => {
      const index = clientCount++;
      const state = { index, pending: [] };
      client.waymark = state;
      client.setRequests(requestsFor(sessions[index % sessions.length], state));
    },
  });
  // autocannon calls the request's onResponse just before it emits 'response' with the time.
  instance.on("response", (client, status, _bytes, ms) => {
    const kind = client.waymark?.pending.shift() ?? "other";
    samples.push({ kind, ms, status });
  });
  const result = await instance;

  const reads = summarize(samples.filter((s) => s.kind.startsWith("read:")));
  const runs = summarize(samples.filter((s) => s.kind === "run"));
  const perPath = Object.fromEntries(
    ["read:list", "read:study", "read:analysis"].map((k) => [
      k,
      summarize(samples.filter((s) => s.kind === k)),
    ]),
  );
  const other = samples.filter((s) => !s.kind.startsWith("read:") && s.kind !== "run").length;
  const transportErrors = result.errors + result.timeouts;
  const figures = {
    benchmark: "api-load",
    measuredAt: new Date().toISOString(),
    machine: { cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? null, node: process.version },
    setup: {
      server:
        "node apps/api/dist/server.js, NODE_ENV=production, WAYMARK_DEMO=1, fresh SQLite in a temp folder",
      connections: CONNECTIONS,
      sessions: sessions.length,
      durationS: DURATION_S,
      mix: `per loop: ${studies.length} × (GET /api/studies, GET /api/studies/:id, GET /api/studies/:id/analyses/:analysisId) + 1 POST /api/studies/:id/analyses`,
      signInMsEach: round(signInMs, 0),
    },
    total: {
      requests: result.requests.total,
      perSecond: round(result.requests.average),
      non2xx: result.non2xx,
      errors: result.errors,
      timeouts: result.timeouts,
      latencyMs: {
        p50: result.latency.p50,
        p90: result.latency.p90,
        p99: result.latency.p99,
        max: result.latency.max,
      },
      unattributedResponses: other,
    },
    reads,
    runs,
    perPath,
    errorSamples: [...errorBodies],
    budget: {
      readP95Ms: BUDGET.readP95Ms,
      errors: BUDGET.errors,
      readP95Met: reads.latencyMs.p95 !== null && reads.latencyMs.p95 < BUDGET.readP95Ms,
      zeroErrorsMet: transportErrors + result.non2xx === 0,
    },
  };

  const outDir = path.join(repoRoot, "bench", "results");
  mkdirSync(outDir, { recursive: true });
  writeFileSync(path.join(outDir, "load.json"), `${JSON.stringify(figures, null, 2)}\n`);

  const line = (name, s) =>
    `  ${name.padEnd(14)} ${String(s.requests).padStart(7)} req ${String(s.perSecond).padStart(7)}/s  p50 ${s.latencyMs.p50} ms  p95 ${s.latencyMs.p95} ms  p99 ${s.latencyMs.p99} ms  non-2xx ${s.non2xx}`;
  console.log(
    `\nAPI load: ${CONNECTIONS} connections, ${DURATION_S} s, ${os.cpus().length} cores (load generator on the same machine)`,
  );
  console.log(line("reads", reads));
  for (const [k, v] of Object.entries(perPath)) console.log(line(`  ${k.slice(5)}`, v));
  console.log(line("analysis runs", runs));
  console.log(
    `  total          ${result.requests.total} requests, non-2xx ${result.non2xx}, errors ${result.errors}, timeouts ${result.timeouts}`,
  );
  console.log(
    `Budget (not asserted): reads p95 < ${BUDGET.readP95Ms} ms — ${figures.budget.readP95Met ? "met" : "NOT met"}; zero errors — ${figures.budget.zeroErrorsMet ? "met" : "NOT met"}`,
  );
  for (const e of errorBodies) console.log(`  error sample: ${e}`);
  console.log(`Server log kept in ${path.relative(repoRoot, serverLogCopy)}`);
  console.log(`Wrote ${path.relative(repoRoot, path.join(outDir, "load.json"))}`);
} catch (err) {
  console.error(err);
  exitCode = 1;
} finally {
  await api.stop({ keepLogAs: serverLogCopy });
}
process.exitCode = exitCode;
