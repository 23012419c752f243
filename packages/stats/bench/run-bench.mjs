// Benchmark of @waymark/stats (run after the build: `npm run bench -w @waymark/stats`).
// 1,000,000 seeded values in 10 groups: the median time of analyze() from dist, and in the
// same run the same work in scipy/statsmodels (timed inside Python; scipy_same_work.py lists
// it: everything analyze() computes at this size, with the library function where one
// exists), their ratio, the ratio against the smaller scipy subset this benchmark used
// before, the peak RSS of this node process, and the command line on a 1,000,000-row CSV
// (time and peak RSS). Writes the figures to bench/results/stats.json at the repo root and
// prints them.
import { execFileSync, spawnSync } from "node:child_process";
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { analyze } from "../dist/analyze.js";

const here = path.dirname(fileURLToPath(import.meta.url));
const repoRoot = path.resolve(here, "../../..");
const PYTHON = process.env.PYTHON ?? "/usr/bin/python3";
const K = 10;
const PER_GROUP = 100_000;
const RUNS = 5;
const SEED = 20_240_611;

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

// Seeded data: normal groups with shifted means and growing SDs, recorded to 3 decimals
// (as measured outcomes are) — and the same draws at full double precision.
const rng = xoroshiro128plus(SEED);
const fullPrecision = [];
const decimals = [];
for (let g = 0; g < K; g++) {
  const full = new Array(PER_GROUP);
  const dec = new Array(PER_GROUP);
  for (let i = 0; i < PER_GROUP; i++) {
    const u = 1 - uniformFloat64(rng);
    const v = uniformFloat64(rng);
    const z = Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    const x = 50 + 0.05 * g + z * (1 + 0.05 * g);
    full[i] = x;
    dec[i] = Math.round(x * 1000) / 1000;
  }
  fullPrecision.push({ name: `G${g + 1}`, values: full });
  decimals.push({ name: `G${g + 1}`, values: dec });
}

function timeAnalyze(groups) {
  analyze({ groups }); // warm-up
  const times = [];
  for (let r = 0; r < RUNS; r++) {
    const t0 = performance.now();
    analyze({ groups });
    times.push(performance.now() - t0);
  }
  return { medianMs: median(times), runsMs: times.map((t) => Math.round(t)) };
}

const waymark = timeAnalyze(decimals);
const waymarkFull = timeAnalyze(fullPrecision);
const peakRssMb = process.resourceUsage().maxRSS / 1024;

// scipy on the very same doubles (the 3-decimal data).
const work = mkdtempSync(path.join(tmpdir(), "waymark-bench-"));
const bin = path.join(work, "values.f64");
const flat = new Float64Array(K * PER_GROUP);
decimals.forEach((g, j) => flat.set(g.values, j * PER_GROUP));
writeFileSync(bin, Buffer.from(flat.buffer));
const scipy = JSON.parse(
  execFileSync(
    PYTHON,
    [
      path.join(here, "scipy_same_work.py"),
      bin,
      JSON.stringify(decimals.map((g) => g.values.length)),
      String(RUNS),
    ],
    { encoding: "utf8", maxBuffer: 1 << 26 },
  ),
);

// The command line on a 1,000,000-row CSV of the same values.
const csv = path.join(work, "million.csv");
const lines = ["group,outcome"];
for (const g of decimals) for (const v of g.values) lines.push(`${g.name},${v}`);
writeFileSync(csv, lines.join("\n") + "\n");
const cliBin = path.join(here, "../bin/waymark-stats.js");
// The CLI's own peak RSS, written by a preload on exit to a file (its stdout is the JSON answer).
const rssFile = path.join(work, "cli-rss.txt");
const rssPreload = `process.on("exit",()=>require("node:fs").writeFileSync(${JSON.stringify(rssFile)},String(process.resourceUsage().maxRSS)))`;
writeFileSync(path.join(work, "rss.cjs"), rssPreload + "\n");
const cliTimes = [];
const cliRssMb = [];
for (let r = 0; r < 3; r++) {
  const t0 = performance.now();
  const res = spawnSync(
    process.execPath,
    [
      "--require",
      path.join(work, "rss.cjs"),
      cliBin,
      "analyze",
      csv,
      "--group",
      "group",
      "--outcome",
      "outcome",
      "--json",
    ],
    { encoding: "utf8", maxBuffer: 1 << 28 },
  );
  cliTimes.push(performance.now() - t0);
  if (res.status !== 0) throw new Error(`CLI failed: ${res.stderr}`);
  cliRssMb.push(Math.round(Number(readFileSync(rssFile, "utf8")) / 1024));
}
rmSync(work, { recursive: true, force: true });

const results = {
  date: new Date().toISOString(),
  machine: {
    node: process.version,
    cpus: (await import("node:os")).cpus().length,
    note: "shared 2-core machine; figures vary with load",
    loadAverage: (await import("node:os")).loadavg().map((x) => Number(x.toFixed(2))),
  },
  data: { groups: K, perGroup: PER_GROUP, total: K * PER_GROUP, seed: SEED, recorded: "3 decimals" },
  waymark: { medianMs: Math.round(waymark.medianMs), runsMs: waymark.runsMs },
  waymarkFullPrecisionDoubles: { medianMs: Math.round(waymarkFull.medianMs), runsMs: waymarkFull.runsMs },
  waymarkWork:
    "analyze() with default options: per-group descriptives with t intervals, one-way ANOVA with the η² interval (noncentral F), Welch's ANOVA, the trimmed-means ANOVA, Kruskal–Wallis, Levene (mean, median), Bartlett, SD ratio, Tukey's fences and studentized residuals, Grubbs-type fences, Q–Q points, Tukey–Kramer with intervals, Games–Howell with intervals, Dunn with Holm and rank-biserial r per pair, Hedges' g per pair, family-wise error, the plan's test and sensitivity table (Shapiro–Wilk, Hodges–Lehmann intervals and the error-rate simulation are skipped at this size)",
  scipy: {
    medianMs: Math.round(scipy.same.medianMs),
    runsMs: scipy.same.runsMs.map((t) => Math.round(t)),
    versions: scipy.versions,
    work: "the same list in scipy/statsmodels/numpy (see bench/scipy_same_work.py)",
  },
  scipySubset: {
    medianMs: Math.round(scipy.subset.medianMs),
    runsMs: scipy.subset.runsMs.map((t) => Math.round(t)),
    work: "f_oneway, anova_oneway(unequal), kruskal, levene(mean), levene(median), bartlett, tukey_hsd (no intervals), per-group describe/percentile/skew/kurtosis",
  },
  ratioWaymarkToScipy: Number((waymark.medianMs / scipy.same.medianMs).toFixed(2)),
  ratioWaymarkToScipySubset: Number((waymark.medianMs / scipy.subset.medianMs).toFixed(2)),
  peakRssMb: Math.round(peakRssMb),
  cli1MRows: {
    medianMs: Math.round(median(cliTimes)),
    runsMs: cliTimes.map((t) => Math.round(t)),
    peakRssMb: Math.max(...cliRssMb),
  },
  goals: { ratio: "≤ 0.5", analyzeMs: "≲ 1000", peakRssMb: "< 400", cliMs: "≤ 2000", cliPeakRssMb: "≤ 400" },
};
const outDir = path.join(repoRoot, "bench/results");
mkdirSync(outDir, { recursive: true });
writeFileSync(path.join(outDir, "stats.json"), JSON.stringify(results, null, 2) + "\n");
console.log(JSON.stringify(results, null, 2));
