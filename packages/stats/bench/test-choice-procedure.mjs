// Benchmark of the whole test-choice procedure (a benchmark that prints figures, not a test).
// Simulates data → analyze() → the primary test → its p at α = .05, over the grid of issue 11:
// k = 3 and 4; equal n (10, 30) and unequal n (8/25/15/40, first k) with the largest SD in the
// smallest and in the largest group; SD ratios 1, 2, 4, 10; normal and t(3) shapes; with and
// without one gross outlier (±10 SD of its group, in a random group); both policies. Prints the
// realised type I error per scenario and the power at Cohen's f = 0.35 beside always-classic,
// always-Welch and always-Kruskal–Wallis (read from the same analyze() result), and measures
// skewed (lognormal) data separately. Writes bench/results/test-choice.json at the repo root.
//
// Usage (after `npm run build -w @waymark/stats`):
//   node bench/test-choice-procedure.mjs            2,000 runs per scenario (long: see the estimate it prints)
//   node bench/test-choice-procedure.mjs --quick    200 runs per scenario (about 5 min on 2 shared cores)
//   node bench/test-choice-procedure.mjs --runs 500 --workers 2
import { mkdirSync, writeFileSync } from "node:fs";
import { availableParallelism } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { Worker, isMainThread, parentPort, workerData } from "node:worker_threads";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { uniformInt } from "pure-rand/distribution/uniformInt";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { analyze } from "../dist/analyze.js";
import { decideTest } from "../dist/choice/decide-test.js";
import { planTest } from "../dist/choice/plan-test.js";

// ---- The two places that follow analyze()'s contract -------------------------------------

/**
 * The p-value of the test the procedure reports as primary: the plan's test after the plan's own
 * rule (the result's `recommendation`, a name kept for the command line's JSON contract).
 * Returns undefined when that test could not be computed.
 */
function primaryP(result) {
  const test = result.recommendation.test;
  const part =
    test === "anova"
      ? result.anova
      : test === "welch"
        ? result.welch
        : test === "kruskal-wallis"
          ? result.kruskalWallis
          : undefined;
  return part && part.available !== false ? { test, p: part.p } : { test, p: undefined };
}

/** The analyze() options for a scenario under a policy (the design answers of a locked plan). */
function designFor(scenario, policy) {
  // A question about means, planned with the scenario's own sizes; the error-rate check is a
  // per-study aid, not part of the procedure being measured, so it is skipped here.
  const equal = scenario.sizes.every((n) => n === scenario.sizes[0]);
  return {
    alpha: ALPHA,
    policy,
    scale: "continuous",
    question: "means",
    plannedSizes: equal ? "equal" : "unequal",
    errorRateCheck: false,
  };
}

/** The decision another policy's plan makes on an analysed data set (what analyze() would return). */
function decisionFor(result, scenario, policy) {
  const o = designFor(scenario, policy);
  const plan = planTest({
    independent: true,
    scale: o.scale,
    question: o.question,
    comparisons: "all-pairs",
    policy,
    plannedSizes: o.plannedSizes,
  });
  const reason = (x) => (x.available === false ? x.reason : null);
  return decideTest(plan, {
    groups: result.groups.map((g) => ({ name: g.name, n: g.n, sd: typeof g.sd === "number" ? g.sd : 0 })),
    comparisons: "all-pairs",
    unavailable: {
      anova: reason(result.anova),
      welch: reason(result.welch),
      "kruskal-wallis": reason(result.kruskalWallis),
    },
  });
}

// ---- Grid ---------------------------------------------------------------------------------

const ALPHA = 0.05;
const EFFECT_F = 0.35;
const OUTLIER_SDS = 10;
const BASE_SEED = 20_261_202;
const POLICIES = ["classic-first", "welch-first"];
const UNEQUAL = [8, 25, 15, 40];

function scenarios() {
  const out = [];
  for (const k of [3, 4]) {
    const designs = [
      { design: "n=10", sizes: Array(k).fill(10), sdIn: "increasing" },
      { design: "n=30", sizes: Array(k).fill(30), sdIn: "increasing" },
      { design: UNEQUAL.slice(0, k).join("/"), sizes: UNEQUAL.slice(0, k), sdIn: "smallest" },
      { design: UNEQUAL.slice(0, k).join("/"), sizes: UNEQUAL.slice(0, k), sdIn: "largest" },
    ];
    for (const shape of ["normal", "t3", "lognormal"]) {
      for (const d of designs) {
        for (const ratio of [1, 2, 4, 10]) {
          if (ratio === 1 && d.sdIn === "largest") continue; // same as "smallest" at ratio 1
          for (const outlier of shape === "lognormal" ? [false] : [false, true]) {
            out.push({ k, shape, ...d, ratio, outlier, sds: sdsFor(d.sizes, d.sdIn, ratio) });
          }
        }
      }
    }
  }
  return out.map((s, i) => ({
    ...s,
    index: i,
    id: `k=${s.k} ${s.design} ${s.ratio === 1 ? "equal SDs" : `SD ratio ${s.ratio}, largest in ${s.sdIn === "increasing" ? "last" : s.sdIn}`} ${s.shape}${s.outlier ? " +outlier" : ""}`,
  }));
}

/** Geometric SDs from 1 to `ratio`, the largest in the smallest/largest group (or the last group). */
function sdsFor(sizes, sdIn, ratio) {
  const k = sizes.length;
  const order = sizes.map((n, i) => ({ n, i }));
  if (sdIn === "smallest") order.sort((a, b) => b.n - a.n || a.i - b.i);
  else if (sdIn === "largest") order.sort((a, b) => a.n - b.n || a.i - b.i);
  const sds = new Array(k);
  order.forEach((o, rank) => (sds[o.i] = ratio ** (rank / (k - 1))));
  return sds;
}

/** Group means with Cohen's f = EFFECT_F against the size-weighted pooled SD, equally spaced. */
function meansFor(s) {
  const N = s.sizes.reduce((a, b) => a + b, 0);
  const pooled = Math.sqrt(s.sizes.reduce((a, n, i) => a + n * s.sds[i] ** 2, 0) / N);
  const raw = s.sizes.map((_, i) => i);
  const centre = raw.reduce((a, m, i) => a + s.sizes[i] * m, 0) / N;
  const spread = Math.sqrt(raw.reduce((a, m, i) => a + s.sizes[i] * (m - centre) ** 2, 0) / N);
  return raw.map((m) => ((m - centre) / spread) * EFFECT_F * pooled);
}

// ---- Data ---------------------------------------------------------------------------------

function normal(rng) {
  const u = 1 - uniformFloat64(rng);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniformFloat64(rng));
}
const LOGNORMAL_MEAN = Math.exp(0.5);
const LOGNORMAL_SD = Math.sqrt((Math.E - 1) * Math.E);

/** A draw with mean 0 and SD 1 of the scenario's shape. */
function unitDraw(rng, shape) {
  if (shape === "normal") return normal(rng);
  if (shape === "t3") {
    // t(3) = Z/√(χ²₃/3), variance 3: divide by √3 for SD 1.
    let chi = 0;
    for (let i = 0; i < 3; i++) chi += normal(rng) ** 2;
    return normal(rng) / Math.sqrt(chi / 3) / Math.sqrt(3);
  }
  return (Math.exp(normal(rng)) - LOGNORMAL_MEAN) / LOGNORMAL_SD;
}

function dataset(s, rng, means) {
  const groups = s.sizes.map((n, g) => ({
    name: `G${g + 1}`,
    values: Array.from({ length: n }, () => 100 + means[g] + s.sds[g] * unitDraw(rng, s.shape)),
  }));
  if (s.outlier) {
    const g = uniformInt(rng, 0, s.k - 1);
    const i = uniformInt(rng, 0, s.sizes[g] - 1);
    const sign = uniformInt(rng, 0, 1) === 0 ? -1 : 1;
    groups[g].values[i] = 100 + means[g] + sign * OUTLIER_SDS * s.sds[g];
  }
  return groups;
}

// ---- One scenario -------------------------------------------------------------------------

function runScenario(s, runs) {
  const out = {};
  for (const [what, means] of [
    ["typeI", Array(s.k).fill(0)],
    ["power", meansFor(s)],
  ]) {
    const rng = xoroshiro128plus(BASE_SEED + 1000 * s.index + (what === "power" ? 1 : 0));
    const hits = { "classic-first": 0, "welch-first": 0, classic: 0, welch: 0, kruskalWallis: 0 };
    const unavailable = { ...hits };
    const chosen = { "classic-first": {}, "welch-first": {} };
    for (let r = 0; r < runs; r++) {
      const groups = dataset(s, rng, means);
      // One analyze() per data set, under the classic-first plan; the welch-first plan's decision
      // on the same data comes from the same public functions analyze() uses (planTest,
      // decideTest), which halves the work without changing what is measured.
      const first = analyze({ groups, options: designFor(s, "classic-first") });
      for (const policy of POLICIES) {
        const decided =
          policy === "classic-first" ? first : { ...first, recommendation: decisionFor(first, s, policy) };
        const { test, p } = primaryP(decided);
        chosen[policy][test] = (chosen[policy][test] ?? 0) + 1;
        if (p === undefined) unavailable[policy]++;
        else if (p < ALPHA) hits[policy]++;
      }
      for (const [key, part] of [
        ["classic", first.anova],
        ["welch", first.welch],
        ["kruskalWallis", first.kruskalWallis],
      ]) {
        if (part.available === false) unavailable[key]++;
        else if (part.p < ALPHA) hits[key]++;
      }
    }
    const rates = Object.fromEntries(Object.entries(hits).map(([key, h]) => [key, h / runs]));
    out[what] = { rates, unavailable, chosen };
  }
  return out;
}

// ---- Workers and report -------------------------------------------------------------------

if (!isMainThread) {
  const { list, runs } = workerData;
  for (const s of list) parentPort.postMessage({ index: s.index, result: runScenario(s, runs) });
} else {
  const args = process.argv.slice(2);
  const flag = (name) => {
    const i = args.indexOf(name);
    return i >= 0 ? args[i + 1] : undefined;
  };
  const runs = args.includes("--quick") ? 200 : Number(flag("--runs") ?? 2000);
  const workers = Math.max(1, Math.min(Number(flag("--workers") ?? 2), availableParallelism()));
  const all = scenarios();
  const started = performance.now();
  const results = new Array(all.length);
  let done = 0;
  await new Promise((resolve, reject) => {
    let live = workers;
    for (let w = 0; w < workers; w++) {
      // Interleave so each worker gets a similar mix of cheap and expensive scenarios.
      const list = all.filter((_, i) => i % workers === w);
      const worker = new Worker(fileURLToPath(import.meta.url), { workerData: { list, runs } });
      worker.on("message", ({ index, result }) => {
        results[index] = result;
        done++;
        const elapsed = (performance.now() - started) / 1000;
        process.stderr.write(
          `\r${done}/${all.length} scenarios, ${elapsed.toFixed(0)} s, about ${((elapsed / done) * (all.length - done)).toFixed(0)} s left   `,
        );
      });
      worker.on("error", reject);
      worker.on("exit", () => --live === 0 && resolve());
    }
  });
  process.stderr.write("\n");
  const seconds = (performance.now() - started) / 1000;
  const se = Math.sqrt((ALPHA * (1 - ALPHA)) / runs);
  const pct = (x) => x.toFixed(3).replace(/^0/, "");
  const header = `${"scenario".padEnd(62)} classic-first welch-first | classic  Welch  K–W`;
  const line = (s, r) =>
    `${s.id.padEnd(62)} ${pct(r.rates["classic-first"]).padStart(13)} ${pct(r.rates["welch-first"]).padStart(11)} | ${pct(r.rates.classic).padStart(7)} ${pct(r.rates.welch).padStart(6)} ${pct(r.rates.kruskalWallis).padStart(5)}`;
  const symmetric = all.filter((s) => s.shape !== "lognormal");
  const skewed = all.filter((s) => s.shape === "lognormal");
  const print = (title, list, what) => {
    console.log(`\n${title}`);
    console.log(header);
    for (const s of list) console.log(line(s, results[s.index][what]));
  };
  console.log(
    `Test-choice procedure through analyze(): ${runs} runs per scenario, α = ${ALPHA}, Monte Carlo SE at .05 = ${se.toFixed(4)}; ${seconds.toFixed(0)} s with ${workers} workers.`,
  );
  print("Type I error, symmetric shapes (goal: every value ≤ .065 under both policies)", symmetric, "typeI");
  print(
    `Power at Cohen's f = ${EFFECT_F}, symmetric shapes (goal: within .03 of always-Welch)`,
    symmetric,
    "power",
  );
  print("Type I error, skewed (no fixed test holds the error rate for means)", skewed, "typeI");
  print(`Power at f = ${EFFECT_F}, skewed (no fixed test holds the error rate for means)`, skewed, "power");

  const worst = (policy) => Math.max(...symmetric.map((s) => results[s.index].typeI.rates[policy]));
  const powerGap = (policy) =>
    Math.max(
      ...symmetric.map((s) => results[s.index].power.rates.welch - results[s.index].power.rates[policy]),
    );
  const summary = Object.fromEntries(
    POLICIES.map((p) => [p, { worstTypeI: worst(p), largestPowerShortfallVsWelch: powerGap(p) }]),
  );
  console.log("\nSummary (symmetric scenarios):");
  for (const p of POLICIES)
    console.log(
      `  ${p}: worst type I error ${pct(summary[p].worstTypeI)}, largest power shortfall against always-Welch ${pct(summary[p].largestPowerShortfallVsWelch)}`,
    );

  const here = path.dirname(fileURLToPath(import.meta.url));
  const outDir = path.resolve(here, "../../../bench/results");
  mkdirSync(outDir, { recursive: true });
  writeFileSync(
    path.join(outDir, "test-choice.json"),
    JSON.stringify(
      {
        measured: new Date().toISOString(),
        primary: "result.recommendation.test (see primaryP in the script)",
        runs,
        alpha: ALPHA,
        effectF: EFFECT_F,
        seed: BASE_SEED,
        seconds: Math.round(seconds),
        workers,
        summary,
        scenarios: all.map((s) => ({
          id: s.id,
          k: s.k,
          sizes: s.sizes,
          sds: s.sds.map((x) => Number(x.toFixed(4))),
          shape: s.shape,
          outlier: s.outlier,
          ...results[s.index],
        })),
      },
      null,
      1,
    ) + "\n",
  );
  console.log(`\nWrote ${path.join(outDir, "test-choice.json")}`);
}
