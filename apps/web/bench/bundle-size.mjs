// Web bundle report (`npm run bench -w @waymark/web`, after `vite build`).
// 1. Sizes of every JS/CSS asset in dist/assets (raw and gzip, level 9), of the first load
//    (what dist/index.html references: the entry script, its modulepreload links and the
//    stylesheets, checked against Vite's manifest) and of each lazy route chunk (the chunk and
//    the static imports it adds beyond the first load), against a 250 KB gzip first-load budget.
// 2. First contentful paint of the sign-in page: the built app served by the built API
//    (NODE_ENV=production, demo mode, fresh database), Debian's /usr/bin/chromium through
//    playwright-core, a fresh browser context (cold cache) for each of 5 loads; the median.
// Prints the figures (the budget is printed, not asserted) and writes bench/results/web.json.
import { existsSync, mkdirSync, readFileSync, readdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";
import { startApi } from "../../api/bench/start-api.mjs";

const here = path.dirname(fileURLToPath(import.meta.url));
const webRoot = path.resolve(here, "..");
const repoRoot = path.resolve(webRoot, "../..");
const dist = path.join(webRoot, "dist");
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const FCP_LOADS = 5;
const BUDGET_FIRST_LOAD_GZIP_KB = 250;
const KB = 1024;

const kb = (bytes) => Math.round((bytes / KB) * 10) / 10;
const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

if (!existsSync(path.join(dist, "index.html"))) {
  throw new Error("apps/web/dist/index.html is missing: run `npm run build -w @waymark/web` first");
}

// --- sizes ---------------------------------------------------------------------------------
const sizeCache = new Map();
function sizeOf(file) {
  if (!sizeCache.has(file)) {
    const buf = readFileSync(path.join(dist, file));
    sizeCache.set(file, { raw: buf.length, gzip: gzipSync(buf, { level: 9 }).length });
  }
  return sizeCache.get(file);
}
const sum = (files) =>
  files.reduce(
    (acc, f) => {
      const s = sizeOf(f);
      return { raw: acc.raw + s.raw, gzip: acc.gzip + s.gzip };
    },
    { raw: 0, gzip: 0 },
  );
const inKb = ({ raw, gzip }) => ({ rawKB: kb(raw), gzipKB: kb(gzip) });

const assets = readdirSync(path.join(dist, "assets"))
  .filter((f) => /\.(js|css)$/.test(f))
  .map((f) => `assets/${f}`)
  .sort();

// What index.html makes the browser fetch before the app can render.
const html = readFileSync(path.join(dist, "index.html"), "utf8");
const attr = (tag, name) => tag.match(new RegExp(`\\s${name}="([^"]*)"`))?.[1];
const toFile = (href) => href.replace(/^\//, "");
const entryScripts = [...html.matchAll(/<script\b[^>]*>/g)]
  .map((m) => m[0])
  .filter((t) => attr(t, "type") === "module" && attr(t, "src"))
  .map((t) => toFile(attr(t, "src")));
const links = [...html.matchAll(/<link\b[^>]*>/g)].map((m) => m[0]);
const preloads = links.filter((t) => attr(t, "rel") === "modulepreload").map((t) => toFile(attr(t, "href")));
const stylesheets = links.filter((t) => attr(t, "rel") === "stylesheet").map((t) => toFile(attr(t, "href")));
const firstLoad = [...new Set([...entryScripts, ...preloads, ...stylesheets])];

// Vite's manifest: the entry's static imports and the lazy (dynamic-entry) route chunks.
const manifestPath = path.join(dist, ".vite", "manifest.json");
const manifest = existsSync(manifestPath) ? JSON.parse(readFileSync(manifestPath, "utf8")) : null;
const staticClosure = (key, seen = new Set()) => {
  const chunk = manifest[key];
  if (!chunk || seen.has(key)) return seen;
  seen.add(key);
  for (const imp of chunk.imports ?? []) staticClosure(imp, seen);
  return seen;
};
const filesOf = (keys) =>
  [...keys]
    .flatMap((k) => [manifest[k].file, ...(manifest[k].css ?? [])])
    .filter((f) => /\.(js|css)$/.test(f));

let manifestCheck = "no manifest (build.manifest is off): lazy routes not reported";
const lazyRoutes = [];
if (manifest) {
  const entryKey = Object.keys(manifest).find((k) => manifest[k].isEntry);
  const fromManifest = new Set(filesOf(staticClosure(entryKey)));
  const missing = [...fromManifest].filter((f) => !firstLoad.includes(f));
  const extra = firstLoad.filter((f) => !fromManifest.has(f));
  manifestCheck =
    missing.length || extra.length
      ? `index.html and the manifest differ: missing from index.html ${JSON.stringify(missing)}, not in the manifest ${JSON.stringify(extra)}`
      : "index.html references exactly the entry's static closure in the manifest";
  for (const [key, chunk] of Object.entries(manifest)) {
    if (!chunk.isDynamicEntry) continue;
    const own = filesOf([key]);
    const added = filesOf(staticClosure(key)).filter((f) => !firstLoad.includes(f));
    lazyRoutes.push({
      route: chunk.src ?? key,
      chunk: chunk.file,
      chunkOnly: inKb(sum(own)),
      addedToFirstLoad: inKb(sum(added)),
      addedFiles: added,
    });
  }
  lazyRoutes.sort((a, b) => a.route.localeCompare(b.route));
}

const firstLoadTotal = sum(firstLoad);
const allTotal = sum(assets);

// --- first contentful paint ----------------------------------------------------------------
const api = await startApi();
let fcp;
try {
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  try {
    const loads = [];
    for (let i = 0; i < FCP_LOADS; i++) {
      const context = await browser.newContext();
      const page = await context.newPage();
      await page.goto(`${api.baseUrl}/sign-in`, { waitUntil: "load" });
      await page.waitForFunction(
        () => performance.getEntriesByName("first-contentful-paint").length > 0,
        null,
        {
          timeout: 30_000,
        },
      );
      loads.push(
        await page.evaluate(() => {
          const nav = performance.getEntriesByType("navigation")[0];
          const res = performance.getEntriesByType("resource");
          return {
            fcpMs: performance.getEntriesByName("first-contentful-paint")[0].startTime,
            domContentLoadedMs: nav?.domContentLoadedEventEnd ?? null,
            loadMs: nav?.loadEventEnd ?? null,
            resources: res.length,
            transferBytes: res.reduce((a, r) => a + (r.transferSize ?? 0), 0) + (nav?.transferSize ?? 0),
          };
        }),
      );
      await context.close();
    }
    fcp = {
      page: "/sign-in",
      loads: loads.length,
      medianFcpMs: Math.round(median(loads.map((l) => l.fcpMs))),
      fcpMs: loads.map((l) => Math.round(l.fcpMs)),
      medianLoadEventMs: Math.round(median(loads.map((l) => l.loadMs ?? 0))),
      medianTransferKB: kb(median(loads.map((l) => l.transferBytes))),
      browser: `${CHROMIUM} ${browser.version()}`,
    };
  } finally {
    await browser.close();
  }
} finally {
  await api.stop();
}

// --- report --------------------------------------------------------------------------------
const figures = {
  benchmark: "web",
  measuredAt: new Date().toISOString(),
  machine: { cpus: os.cpus().length, node: process.version },
  gzip: "node:zlib level 9",
  firstLoad: { files: firstLoad, ...inKb(firstLoadTotal), manifestCheck },
  budget: {
    firstLoadGzipKB: BUDGET_FIRST_LOAD_GZIP_KB,
    met: firstLoadTotal.gzip / KB < BUDGET_FIRST_LOAD_GZIP_KB,
  },
  lazyRoutes,
  assets: assets.map((f) => ({ file: f, ...inKb(sizeOf(f)) })),
  allAssets: inKb(allTotal),
  firstContentfulPaint: fcp,
};
const outDir = path.join(repoRoot, "bench", "results");
mkdirSync(outDir, { recursive: true });
writeFileSync(path.join(outDir, "web.json"), `${JSON.stringify(figures, null, 2)}\n`);

const row = (name, s) =>
  `  ${name.padEnd(44)} ${String(s.rawKB).padStart(8)} KB ${String(s.gzipKB).padStart(8)} KB gzip`;
console.log("\nWeb bundle (KB = 1024 bytes)");
for (const a of figures.assets) console.log(row(a.file, a));
console.log(row("all JS/CSS", figures.allAssets));
console.log(`First load (${firstLoad.join(", ")}):`);
console.log(row("first load", figures.firstLoad));
console.log(`  ${manifestCheck}`);
console.log("Lazy routes (chunk / added beyond the first load):");
for (const r of lazyRoutes)
  console.log(
    `  ${r.route.padEnd(44)} ${r.chunkOnly.gzipKB} KB gzip / +${r.addedToFirstLoad.gzipKB} KB gzip`,
  );
console.log(
  `Budget (not asserted): first load < ${BUDGET_FIRST_LOAD_GZIP_KB} KB gzip — ${figures.budget.met ? "met" : "NOT met"} (${figures.firstLoad.gzipKB} KB)`,
);
console.log(
  `First contentful paint, ${fcp.page}, median of ${fcp.loads} cold loads: ${fcp.medianFcpMs} ms (${fcp.fcpMs.join(", ")}); load event ${fcp.medianLoadEventMs} ms; ${fcp.medianTransferKB} KB transferred`,
);
console.log(`Wrote ${path.relative(repoRoot, path.join(outDir, "web.json"))}`);
