// Where one route's time goes (`node apps/api/bench/profile-route.mjs /api/studies`, after the
// build). Starts the built API with V8's CPU profiler, gives the demo analyst 50 studies (as
// compare.mjs does), times 200 serial GETs, then loads the route at 10 connections for 8 s and
// prints the functions with the most time during the load, by self time and including callees.
// The path may name ":id" and ":aid" (a demo study with a stored analysis and that analysis).
// The profile is kept in bench/tmp/profiles for a closer look (Chrome DevTools opens it).
import { mkdirSync, readdirSync, readFileSync, rmSync, statSync } from "node:fs";
import path from "node:path";
import autocannon from "autocannon";
import { DEMO_ANALYST, repoRoot, signIn, startApi } from "./start-api.mjs";

const route = process.argv[2] ?? "/api/studies";
const LOAD_S = 8;
const dir = path.join(repoRoot, "bench", "tmp", "profiles");
rmSync(dir, { recursive: true, force: true });
mkdirSync(dir, { recursive: true });

const api = await startApi({ nodeArgs: ["--cpu-prof", `--cpu-prof-dir=${dir}`] });
let loadStart = 0;
let loadEnd = 0;
try {
  const s = await signIn(api.baseUrl, DEMO_ANALYST);
  const headers = { cookie: s.cookie, "accept-encoding": "identity" };
  const list = async () => (await (await fetch(api.baseUrl + "/api/studies", { headers })).json()).studies;
  for (let i = (await list()).length; i < 50; i++)
    await fetch(`${api.baseUrl}/api/studies`, {
      method: "POST",
      headers: { ...headers, "content-type": "application/json", "x-csrf-token": s.csrfToken },
      body: JSON.stringify({
        title: `Bench study ${i + 1}`,
        objective: "Invented study for the profile.",
        outcomeName: "Yield",
        outcomeUnit: "g",
        factorName: "Line",
        levels: ["North", "South", "East"],
        controlLevel: null,
        context: "general",
      }),
    });
  const analysed = (await list()).find((x) => x.latestAnalysisId);
  const target = route.replace(":id", analysed.id).replace(":aid", analysed.latestAnalysisId);
  const times = [];
  for (let i = 0; i < 250; i++) {
    const t0 = performance.now();
    const res = await fetch(api.baseUrl + target, { headers });
    await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`GET ${target} → ${res.status}`);
    if (i >= 50) times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  console.log(`GET ${target}: serial median ${times[times.length >> 1].toFixed(2)} ms (fetch client)`);
  loadStart = Date.now();
  const r = await autocannon({ url: api.baseUrl + target, connections: 10, duration: LOAD_S, headers });
  loadEnd = Date.now();
  console.log(`at 10 connections: ${Math.round(r.requests.average)} req/s, non-2xx ${r.non2xx}`);
} finally {
  await api.stop();
}

// The main thread's profile is the largest file; only samples taken during the load count.
const file = readdirSync(dir)
  .map((f) => path.join(dir, f))
  .sort((a, b) => statSync(b).size - statSync(a).size)[0];
const p = JSON.parse(readFileSync(file, "utf8"));
const byId = new Map(p.nodes.map((n) => [n.id, n]));
const parent = new Map();
for (const n of p.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
// Profile times are microseconds on the process's monotonic clock; the load's window is the last
// LOAD_S seconds before shutdown, less a margin at each end.
const end = p.endTime - (Date.now() - loadEnd) * 1000 - 300_000;
const start = end - (loadEnd - loadStart) * 1000 + 600_000;
const self = new Map();
let t = p.startTime;
let total = 0;
for (let i = 0; i < p.samples.length; i++) {
  t += p.timeDeltas[i] ?? 0;
  if (t < start || t > end) continue;
  const d = p.timeDeltas[i] ?? 0;
  self.set(p.samples[i], (self.get(p.samples[i]) ?? 0) + d);
  total += d;
}
const name = (n) =>
  `${n.callFrame.functionName || "(anonymous)"} ${n.callFrame.url.replace(/.*node_modules\//, "").replace(/.*\/dist\//, "dist/")}:${n.callFrame.lineNumber + 1}`;
const selfBy = new Map();
const inclusive = new Map();
for (const [id, us] of self) {
  selfBy.set(name(byId.get(id)), (selfBy.get(name(byId.get(id))) ?? 0) + us);
  const seen = new Set();
  for (let cur = id; cur !== undefined; cur = parent.get(cur)) {
    const k = name(byId.get(cur));
    if (!seen.has(k)) inclusive.set(k, (inclusive.get(k) ?? 0) + us);
    seen.add(k);
  }
}
const top = (m, n) =>
  [...m]
    .sort((a, b) => b[1] - a[1])
    .slice(0, n)
    .map(([k, us]) => `${((us / total) * 100).toFixed(1).padStart(5)}%  ${k}`)
    .join("\n");
console.log(`\nself time during the load (${(total / 1e6).toFixed(1)} s sampled):\n${top(selfBy, 25)}`);
console.log(`\nincluding callees:\n${top(inclusive, 40)}`);
console.log(`\nprofile: ${path.relative(repoRoot, file)}`);
