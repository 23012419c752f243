// Prints the figures of the last `npm run bench` beside the goals of the performance issue, from
// bench/results/api-compare.json and bench/results/stats.json (figures only; nothing is asserted).
import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const dir = path.join(path.dirname(fileURLToPath(import.meta.url)), "results");
const read = (f) => JSON.parse(readFileSync(path.join(dir, f), "utf8"));
const api = read("api-compare.json");
const stats = read("stats.json");
const route = (prefix) => api.routes.find((r) => r.route.startsWith(prefix));
const list = route("GET /api/studies (");
const health = route("GET /api/health");
const errors = api.routes.reduce((n, r) => n + r.at50.api.errors + r.at50.api.non2xx, 0);

const rows = [
  [
    "(a) studies list throughput, share of bare Express",
    `${Math.round(list.throughputRatio * 100)}%`,
    "≥ 40%",
    list.throughputRatio >= 0.4,
  ],
  ["(a) studies list serial median", `${list.serialMedianMs.api} ms`, "≤ 3 ms", list.serialMedianMs.api <= 3],
  [
    "(a) health serial median",
    `${health.serialMedianMs.api} ms`,
    "≤ 1.5 ms",
    health.serialMedianMs.api <= 1.5,
  ],
  ["(a) errors and non-2xx at 50 connections", String(errors), "0", errors === 0],
  [
    "(b) import of compiled app.js (median)",
    `${api.importAppJs.medianS} s`,
    "≤ 1.5 s",
    api.importAppJs.medianS <= 1.5,
  ],
  [
    "(c) analyze() time ÷ scipy's, same work",
    String(stats.ratioWaymarkToScipy),
    "≤ 0.5",
    stats.ratioWaymarkToScipy <= 0.5,
  ],
  // The smaller subset earlier rounds timed, kept so the figure stays comparable across rounds.
  [
    "(c) analyze() time ÷ scipy's earlier subset",
    String(stats.ratioWaymarkToScipySubset),
    "≤ 0.5",
    stats.ratioWaymarkToScipySubset <= 0.5,
  ],
  [
    "(d) command line, 1,000,000 rows",
    `${(stats.cli1MRows.medianMs / 1000).toFixed(2)} s`,
    "≤ 2 s",
    stats.cli1MRows.medianMs <= 2000,
  ],
  [
    "(d) command line peak memory",
    `${stats.cli1MRows.peakRssMb ?? "?"} MB`,
    "≤ 400 MB",
    (stats.cli1MRows.peakRssMb ?? Infinity) <= 400,
  ],
];
console.log(
  `\nPerformance goals (API run ${api.date}, stats run ${stats.date}; load average ${api.machine.loadAverage.join(" ")}):`,
);
for (const r of api.routes)
  console.log(
    `  ${r.route.padEnd(36)} serial ${r.serialMedianMs.api} ms (bare ${r.serialMedianMs.bare})  ` +
      `${r.at50.api.perSecond} req/s (bare ${r.at50.bare.perSecond}, ${Math.round(r.throughputRatio * 100)}%)`,
  );
for (const [what, value, goal, met] of rows)
  console.log(
    `  ${what.padEnd(52)} ${value.padStart(9)}   goal ${goal.padEnd(9)} ${met ? "met" : "NOT met"}`,
  );
