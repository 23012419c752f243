// Hostile-upload benchmark (`npm run bench -w @waymark/api`, after the build). Starts the built
// API (demo mode, fresh database), signs in the demo analyst and uploads every case of the
// generated bad-input corpus (tests/fixtures/bad-input/generate-hostile.mjs, seeded) plus a
// multipart body without a boundary to a study with a locked plan. For each case it records the
// answer, its time, and the server's peak memory above its resident size just before (Linux
// VmHWM, reset per case through /proc/<pid>/clear_refs), while analysis runs of a demo study go
// on back to back beside it (a seeded 20,000-value dataset); their slowest time is compared with the same run's quiet median.
// Goals (printed, not asserted): each case answered as expected within 2 s, peak growth
// ≤ 200 MB, the parallel analysis within 2× its quiet time. Writes bench/results/hostile-uploads.json.
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { hostileCases } from "../../../tests/fixtures/bad-input/generate-hostile.mjs";
import { DEMO_ANALYST, repoRoot, signIn, startApi } from "./start-api.mjs";

const GOAL = { ms: 2000, growthMb: 200, analysisRatio: 2 };
const round = (x, d = 0) => Math.round(x * 10 ** d) / 10 ** d;
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

function memoryKb(pid, field) {
  const m = new RegExp(`^${field}:\\s+(\\d+) kB`, "m").exec(readFileSync(`/proc/${pid}/status`, "utf8"));
  return m ? Number(m[1]) : NaN;
}

const api = await startApi({ extraEnv: { UPLOAD_LIMIT_MB: "50" } });
const results = [];
let exitCode = 0;
try {
  const s = await signIn(api.baseUrl, DEMO_ANALYST);
  const call = async (method, p, body, headers = {}) => {
    const res = await fetch(api.baseUrl + p, {
      method,
      headers: {
        cookie: s.cookie,
        ...(method === "GET" ? {} : { "x-csrf-token": s.csrfToken }),
        ...(body && !(body instanceof FormData) ? { "content-type": "application/json" } : {}),
        ...headers,
      },
      body: body instanceof FormData || typeof body === "string" ? body : body && JSON.stringify(body),
    });
    const text = await res.text();
    let json = null;
    try {
      json = JSON.parse(text);
    } catch {
      // not JSON
    }
    return { status: res.status, json, bytes: text.length };
  };

  // Two studies with levels North, South, East and a locked plan: one takes the hostile uploads,
  // the other a seeded 20,000-value dataset whose analysis runs are timed beside each upload.
  const lockedStudy = async (title) => {
    const created = await call("POST", "/api/studies", {
      title,
      objective: "Benchmark fixture.",
      outcomeName: "Yield",
      outcomeUnit: "g",
      factorName: "Line",
      levels: ["North", "South", "East"],
      controlLevel: null,
      context: "general",
    });
    const id = created.json.study.id;
    await call("PUT", `/api/studies/${id}/design`, {
      independence: "independent",
      scale: "continuous",
      question: "means",
      groupSizes: "equal",
      hasControl: "no",
      comparisons: "all-pairs",
      assignment: "randomized",
    });
    const locked = await call("POST", `/api/studies/${id}/plan/lock`);
    if (locked.status !== 200)
      throw new Error(`could not lock the plan: ${locked.status} ${JSON.stringify(locked.json)}`);
    return id;
  };
  const studyId = await lockedStudy("Hostile uploads");
  const quietStudy = await lockedStudy("Analysis beside the uploads");
  let seed = 7;
  const next = () => (seed = (seed * 48271) % 2147483647) / 2147483647;
  const lines = ["Line,Yield (g)"];
  for (let i = 0; i < 20_000; i++)
    lines.push(`${["North", "South", "East"][i % 3]},${(10 + (i % 3) + next() * 4).toFixed(2)}`);
  const form = new FormData();
  form.set("groupColumn", "Line");
  form.set("outcomeColumn", "Yield (g)");
  form.set("file", new Blob([lines.join("\n")]), "yields.csv");
  const stored = await call("POST", `/api/studies/${quietStudy}/datasets`, form);
  if (stored.status !== 201) throw new Error(`could not store the analysis dataset: ${stored.status}`);
  const target = { id: quietStudy, datasetId: stored.json.dataset.id };
  const analysis = async () => {
    const t = performance.now();
    const r = await call("POST", `/api/studies/${target.id}/analyses`, { datasetId: target.datasetId });
    return { ms: performance.now() - t, status: r.status };
  };
  const quiet = [];
  for (let i = 0; i < 7; i++) quiet.push((await analysis()).ms);
  const quietMs = median(quiet);
  console.log(`Quiet analysis run (20,000 values in 3 groups): median ${round(quietMs)} ms of 7`);

  const cases = await hostileCases();
  cases.push({
    name: "multipart without a boundary",
    file: null,
    raw: { contentType: "multipart/form-data", body: "--x\r\nbroken\r\n" },
    status: 400,
    message: "[Bb]oundary",
    finding: 8,
  });

  for (const c of cases) {
    writeFileSync(`/proc/${api.pid}/clear_refs`, "5"); // resets the peak (VmHWM) to the current size
    const rssBefore = memoryKb(api.pid, "VmRSS");
    let form;
    if (!c.raw) {
      form = new FormData();
      form.set("groupColumn", "Line");
      form.set("outcomeColumn", "Yield (g)");
      form.set("file", new Blob([c.bytes]), c.file);
    }
    const t0 = performance.now();
    let done = false;
    const upload = (
      c.raw
        ? call("POST", `/api/studies/${studyId}/datasets`, c.raw.body, { "content-type": c.raw.contentType })
        : call("POST", `/api/studies/${studyId}/datasets`, form)
    ).then((r) => {
      done = true;
      return { ...r, ms: performance.now() - t0 };
    });
    // Analysis runs back to back while the upload is in flight (at least one).
    const runs = [];
    do runs.push(await analysis());
    while (!done);
    const res = await upload;
    const peakKb = memoryKb(api.pid, "VmHWM");
    const message = res.json?.error?.message ?? "";
    const answered = res.status === c.status && new RegExp(c.message).test(message);
    const slowest = Math.max(...runs.map((r) => r.ms));
    const row = {
      case: c.name,
      finding: c.finding,
      sizeMb: c.bytes ? round(c.bytes.length / 1e6, 2) : 0,
      status: res.status,
      expected: c.status,
      answeredAsExpected: answered,
      ms: round(res.ms),
      peakGrowthMb: round((peakKb - rssBefore) / 1024),
      parallelAnalysisMs: round(slowest),
      parallelAnalysisRuns: runs.length,
      analysisRatio: round(slowest / quietMs, 2),
      answerBytes: res.bytes,
      message: message.slice(0, 160),
    };
    row.meetsGoal =
      answered &&
      row.ms <= GOAL.ms &&
      row.peakGrowthMb <= GOAL.growthMb &&
      row.analysisRatio <= GOAL.analysisRatio &&
      runs.every((r) => r.status === 201);
    results.push(row);
    console.log(
      `${row.meetsGoal ? "met    " : "NOT MET"} ${c.name.padEnd(52)} ${String(res.status).padStart(3)} ${String(row.ms).padStart(6)} ms  +${String(row.peakGrowthMb).padStart(4)} MB  analysis ${row.parallelAnalysisMs} ms (×${row.analysisRatio})`,
    );
    if (!answered) console.log(`        expected ${c.status} /${c.message}/, got: ${message.slice(0, 200)}`);
  }
  const health = await fetch(`${api.baseUrl}/api/health`);
  const summary = {
    date: new Date().toISOString(),
    machine: `${os.cpus().length} cores, ${round(os.totalmem() / 2 ** 30, 1)} GB, node ${process.version}`,
    goal: GOAL,
    quietAnalysisMs: round(quietMs),
    cases: results,
    allMet: results.every((r) => r.meetsGoal),
    worstMs: Math.max(...results.map((r) => r.ms)),
    worstGrowthMb: Math.max(...results.map((r) => r.peakGrowthMb)),
    worstAnalysisRatio: Math.max(...results.map((r) => r.analysisRatio)),
    serverStillServing: health.ok,
  };
  console.log(
    `\n${results.filter((r) => r.meetsGoal).length}/${results.length} cases within the goal; worst answer ${summary.worstMs} ms, worst peak growth ${summary.worstGrowthMb} MB, worst parallel analysis ×${summary.worstAnalysisRatio}; server still serving: ${health.ok}`,
  );
  const out = path.join(repoRoot, "bench", "results", "hostile-uploads.json");
  mkdirSync(path.dirname(out), { recursive: true });
  writeFileSync(out, JSON.stringify(summary, null, 2) + "\n");
  console.log(`Written to ${path.relative(repoRoot, out)}`);
} catch (e) {
  console.error(e);
  exitCode = 1;
} finally {
  await api.stop({ keepLogAs: path.join(repoRoot, "bench", "tmp", "api-hostile-server.log") });
}
process.exit(exitCode);
