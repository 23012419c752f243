// The load benchmark on PostgreSQL with one and with two API instances behind HAProxy, side by
// side in one run (`npm run bench:instances`, after `npm run build`). Prints throughput, p50/p95
// and errors for reads and for analysis runs; writes bench/results/instances.json. Figures only:
// nothing here is asserted.
//
// Each phase: a fresh PostgreSQL cluster, n instances of apps/api/dist/server.js (demo mode,
// NODE_ENV=production, each analysis worker pool one thread), deploy/haproxy.cfg in front, and
// CONNECTIONS virtual people (own sessions as the demo analyst) looping for DURATION_S seconds
// over GET /api/studies, GET /api/studies/:id, GET /api/studies/:id/analyses/:analysisId and one
// POST /api/studies/:id/analyses (an analysis run on GROUP_SIZE values per group) each.
//
// How the cores are shared (see CPU_PLAN below): with 2 cores, each instance is pinned to a core
// of its own (taskset), while PostgreSQL, HAProxy and this load generator float over both; with
// one instance, it has core 0 and the rest float the same way. BENCH_PIN=0 leaves all to the scheduler.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { Client } from "./client.js";
import {
  DEMO_PASSWORD,
  freePort,
  repoRoot,
  startInstance,
  startPostgres,
  startProxy,
  type Instance,
} from "./harness.js";
import { lockedStudy, uploadDataset, yieldCsv } from "./workload.js";

const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 30);
const GROUP_SIZE = Number(process.env.BENCH_GROUP_SIZE ?? 200);
const STUDIES = 5;
const cores = os.availableParallelism();
/** Which CPUs each instance is pinned to; undefined leaves the scheduler free (one core, or taskset missing). */
const pinned = cores >= 2 && process.env.BENCH_PIN !== "0";
const pin = (i: number) => (pinned ? String(i % cores) : undefined);

/** CPU seconds a process has used so far (user + system, from /proc), or null where /proc is missing. */
function cpuSeconds(pid: number | undefined): number | null {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1]!.split(" ");
    // utime and stime are fields 14 and 15 of the whole line, 12 and 13 after "pid (comm) ".
    return (Number(fields[11]) + Number(fields[12])) / 100;
  } catch {
    return null;
  }
}

/** Busy and total CPU time of the whole machine so far (all cores, from /proc/stat), in seconds. */
function machineCpu(): { busy: number; total: number } | null {
  try {
    const [, ...v] = readFileSync("/proc/stat", "utf8").split("\n")[0]!.trim().split(/\s+/);
    const n = v.map(Number);
    const idle = n[3]! + (n[4] ?? 0);
    const total = n.slice(0, 8).reduce((x, y) => x + y, 0);
    return { busy: (total - idle) / 100, total: total / 100 };
  } catch {
    return null;
  }
}

/** CPU seconds of the cluster's postmaster and its live children (the connections' backends). */
function postgresCpuSeconds(dataDir: string): number | null {
  try {
    const postmaster = Number(readFileSync(path.join(dataDir, "postmaster.pid"), "utf8").split("\n")[0]);
    let sum = cpuSeconds(postmaster) ?? 0;
    for (const entry of readdirSync("/proc")) {
      if (!/^\d+$/.test(entry)) continue;
      try {
        const after = readFileSync(`/proc/${entry}/stat`, "utf8").split(") ")[1]!.split(" ");
        if (Number(after[1]) === postmaster) sum += (Number(after[11]) + Number(after[12])) / 100;
      } catch {
        // The process ended while we looked.
      }
    }
    return sum;
  } catch {
    return null;
  }
}

const diff = (a: number | null, b: number | null) => (a === null || b === null ? null : round(b - a, 1));

interface Sample {
  kind: "read" | "run";
  ms: number;
  status: number;
  /** Whether the reply came within the measured window (requests still queued at its end finish after it). */
  inWindow: boolean;
  error?: string;
}

const percentile = (sorted: number[], p: number) =>
  sorted.length === 0
    ? null
    : sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
const round = (x: number | null, d = 1) => (x === null ? null : Math.round(x * 10 ** d) / 10 ** d);

function summarize(samples: Sample[]) {
  const ok = samples.filter((s) => s.status >= 200 && s.status < 300);
  const inWindow = ok.filter((s) => s.inWindow).length;
  const lat = ok.map((s) => s.ms).sort((x, y) => x - y);
  const byStatus: Record<string, number> = {};
  for (const s of samples)
    byStatus[s.error ? "transport" : s.status] = (byStatus[s.error ? "transport" : s.status] ?? 0) + 1;
  return {
    completed: ok.length,
    completedInWindow: inWindow,
    perSecond: round(inWindow / DURATION_S, 2),
    p50Ms: round(percentile(lat, 50)),
    p95Ms: round(percentile(lat, 95)),
    maxMs: round(lat.at(-1) ?? null),
    errors: samples.length - ok.length,
    byStatus,
  };
}

async function phase(instances: 1 | 2) {
  const pg = await startPostgres();
  const started: Instance[] = [];
  let proxy: Awaited<ReturnType<typeof startProxy>> | null = null;
  try {
    const proxyPort = await freePort();
    const publicUrl = `http://127.0.0.1:${proxyPort}`;
    for (let i = 0; i < instances; i++)
      started.push(
        await startInstance({
          name: `api${i + 1}`,
          databaseUrl: pg.url,
          publicUrl,
          cpus: pin(i),
          env: { SIGNIN_LIMIT_PER_IP: "100000", TASK_WORKER_THREADS: "1" },
        }),
      );
    // With one instance the second server address is a closed port; the health check keeps it out.
    const ports: [number, number] = [started[0]!.port, started[1]?.port ?? (await freePort())];
    proxy = await startProxy(ports, { port: proxyPort, expectServers: instances });

    // The studies the load works on: locked plans, one dataset and one stored analysis each.
    const owner = new Client(proxy.url, { keepAlive: true });
    if ((await owner.signIn("analyst@waymark.test", DEMO_PASSWORD)).status !== 200)
      throw new Error("sign-in failed");
    const studies: { id: number; datasetId: number; analysisId: number }[] = [];
    for (let s = 0; s < STUDIES; s++) {
      const id = await lockedStudy(owner, `Benchmark study ${s + 1}`);
      const ds = await uploadDataset(owner, id, yieldCsv(100 + s, GROUP_SIZE));
      const run = await owner.json<{ analysis: { id: number } }>(
        "POST",
        `/api/studies/${id}/analyses`,
        { datasetId: ds.id },
        201,
      );
      studies.push({ id, datasetId: ds.id, analysisId: run.analysis.id });
    }
    const clients: Client[] = [];
    for (let i = 0; i < CONNECTIONS; i++) {
      const c = new Client(proxy.url, { keepAlive: true });
      const r = await c.signIn("analyst@waymark.test", DEMO_PASSWORD);
      if (r.status !== 200) throw new Error(`sign-in ${i}: ${r.status} ${r.text}`);
      c.discardBodies = true;
      clients.push(c);
    }

    const samples: Sample[] = [];
    const errorBodies = new Set<string>();
    const stopAt = performance.now() + DURATION_S * 1000;
    const t0 = performance.now();
    const cpu0 = {
      machine: machineCpu(),
      loadGenerator: process.cpuUsage(),
      instances: started.map((i) => cpuSeconds(i.child.pid)),
      proxy: cpuSeconds(proxy.child.pid),
      postgres: postgresCpuSeconds(pg.dir),
    };
    const record = async (kind: Sample["kind"], send: () => ReturnType<Client["request"]>) => {
      const start = performance.now();
      try {
        const r = await send();
        samples.push({ kind, ms: r.ms, status: r.status, inWindow: performance.now() <= stopAt });
        if ((r.status < 200 || r.status > 299) && errorBodies.size < 5)
          errorBodies.add(`${kind} ${r.status} ${r.text.slice(0, 200)}`);
      } catch (e) {
        samples.push({
          kind,
          ms: performance.now() - start,
          status: 0,
          error: String(e),
          inWindow: performance.now() <= stopAt,
        });
        if (errorBodies.size < 5) errorBodies.add(`${kind} ${String(e)}`);
      }
    };
    await Promise.all(
      clients.map(async (c, i) => {
        for (let loop = 0; performance.now() < stopAt; loop++) {
          const s = studies[(i + loop) % studies.length]!;
          await record("read", () => c.request("GET", "/api/studies"));
          await record("read", () => c.request("GET", `/api/studies/${s.id}`));
          await record("read", () => c.request("GET", `/api/studies/${s.id}/analyses/${s.analysisId}`));
          await record("run", () =>
            c.request("POST", `/api/studies/${s.id}/analyses`, JSON.stringify({ datasetId: s.datasetId }), {
              "content-type": "application/json",
            }),
          );
        }
      }),
    );
    // Requests still in flight at the end are counted when they finish, over the whole span.
    const seconds = (performance.now() - t0) / 1000;
    const m1 = machineCpu();
    const lg = process.cpuUsage(cpu0.loadGenerator);
    const cpu = {
      wallS: round(seconds, 1),
      machineBusyS: cpu0.machine && m1 ? round(m1.busy - cpu0.machine.busy, 1) : null,
      machineTotalS: cpu0.machine && m1 ? round(m1.total - cpu0.machine.total, 1) : null,
      loadGeneratorS: round((lg.user + lg.system) / 1e6, 1),
      instancesS: started.map((i, k) => diff(cpu0.instances[k] ?? null, cpuSeconds(i.child.pid))),
      proxyS: diff(cpu0.proxy, cpuSeconds(proxy.child.pid)),
      postgresS: diff(cpu0.postgres, postgresCpuSeconds(pg.dir)),
    };
    const served: Record<string, number> = {};
    for (const c of clients) for (const [k, n] of c.servedBy) served[k] = (served[k] ?? 0) + n;
    return {
      instances,
      seconds: round(seconds, 1),
      reads: summarize(samples.filter((s) => s.kind === "read")),
      runs: summarize(samples.filter((s) => s.kind === "run")),
      servedBy: served,
      // Runs claimed more than once: taken over after a lease lapsed (wasted work when it happens under load).
      runsClaimedAgain: pg.count(`SELECT count(*) FROM analysis_runs WHERE attempts > 1`),
      cpu,
      errorSamples: [...errorBodies],
    };
  } finally {
    await proxy?.stop();
    await Promise.allSettled(started.map((i) => i.kill("SIGTERM")));
    pg.stop();
  }
}

const one = await phase(1);
const two = await phase(2);
// Runs completed within the 30 s window, so a longer queue at the end does not count for either side.
const ratio =
  one.runs.completedInWindow > 0 ? round(two.runs.completedInWindow / one.runs.completedInWindow, 2) : null;
const figures = {
  benchmark: "api-instances",
  measuredAt: new Date().toISOString(),
  machine: { cpus: cores, cpuModel: os.cpus()[0]?.model ?? null, node: process.version },
  setup: {
    database: "PostgreSQL (Debian) in a throwaway cluster on 127.0.0.1, fsync off",
    proxy: "HAProxy with deploy/haproxy.cfg (least connections, readiness checks)",
    server:
      "node apps/api/dist/server.js, NODE_ENV=production, WAYMARK_DEMO=1, one analysis worker thread per instance",
    cpuPlan: !pinned
      ? "no pinning (BENCH_PIN=0 or one core): the scheduler shares the cores among instances, PostgreSQL, HAProxy and the load generator"
      : cores >= 2
        ? "each instance pinned to its own core with taskset (api1: core 0, api2: core 1); PostgreSQL, HAProxy and the load generator unpinned, sharing both cores"
        : "one core: everything shares it",
    connections: CONNECTIONS,
    durationS: DURATION_S,
    mix: `per loop: GET /api/studies, GET /api/studies/:id, GET /api/studies/:id/analyses/:analysisId, POST /api/studies/:id/analyses (${GROUP_SIZE} values per group, 3 groups)`,
  },
  phases: [one, two],
  runsRatioTwoToOne: ratio,
  goal: {
    zeroErrors: one.reads.errors + one.runs.errors + two.reads.errors + two.runs.errors === 0,
    runsRatioAtLeast: 1.6,
    met: (ratio ?? 0) >= 1.6,
  },
};
const outDir = path.join(repoRoot, "bench", "results");
mkdirSync(outDir, { recursive: true });
writeFileSync(path.join(outDir, "instances.json"), `${JSON.stringify(figures, null, 2)}\n`);

const row = (label: string, f: (p: typeof one) => unknown) =>
  `  ${label.padEnd(22)} ${String(f(one)).padStart(14)} ${String(f(two)).padStart(14)}`;
console.log(
  `\nAPI on PostgreSQL behind HAProxy: ${CONNECTIONS} connections, ${DURATION_S} s per phase, ${cores} cores`,
);
console.log(`  cores: ${figures.setup.cpuPlan}`);
console.log(`  ${"".padEnd(22)} ${"1 instance".padStart(14)} ${"2 instances".padStart(14)}`);
console.log(row("reads in window", (p) => p.reads.completedInWindow));
console.log(row("reads /s", (p) => p.reads.perSecond));
console.log(row("reads p50 / p95 ms", (p) => `${p.reads.p50Ms} / ${p.reads.p95Ms}`));
console.log(row("reads errors", (p) => p.reads.errors));
console.log(row("runs in window", (p) => p.runs.completedInWindow));
console.log(row("runs incl. the tail", (p) => p.runs.completed));
console.log(row("runs /s", (p) => p.runs.perSecond));
console.log(row("runs p50 / p95 ms", (p) => `${p.runs.p50Ms} / ${p.runs.p95Ms}`));
console.log(row("runs errors", (p) => p.runs.errors));
console.log(row("runs claimed again", (p) => p.runsClaimedAgain));
console.log(
  row("requests per instance", (p) =>
    Object.entries(p.servedBy)
      .sort()
      .map(([, n]) => n)
      .join(" + "),
  ),
);
console.log(
  `  two instances completed ${ratio}× the analysis runs of one (goal ≥ 1.6: ${figures.goal.met ? "met" : "NOT met"}); zero errors: ${figures.goal.zeroErrors ? "met" : "NOT met"}`,
);
console.log(row("CPU s: api (each)", (p) => p.cpu.instancesS.join(" + ")));
console.log(
  row("runs per API CPU s", (p) => {
    const used = p.cpu.instancesS.reduce<number>((x, y) => x + (y ?? 0), 0);
    return used > 0 ? round(p.runs.completed / used, 2) : null;
  }),
);
console.log(row("CPU s: load generator", (p) => p.cpu.loadGeneratorS));
console.log(row("CPU s: HAProxy", (p) => p.cpu.proxyS));
console.log(row("CPU s: PostgreSQL", (p) => p.cpu.postgresS));
console.log(row("CPU s: machine busy", (p) => `${p.cpu.machineBusyS} of ${p.cpu.machineTotalS}`));
console.log("  (machine busy also counts whatever else ran on the machine at the time)");
for (const e of [...one.errorSamples, ...two.errorSamples]) console.log(`  error sample: ${e}`);
console.log(`Wrote ${path.relative(repoRoot, path.join(outDir, "instances.json"))}`);
