// Licences of the production dependencies (`npm run licences`).
// The production set is npm's own: every installed package reachable through the workspaces'
// `dependencies` (not devDependencies), from `npm query .prod`. license-checker-rseidelsohn
// reads each package's licence (package.json, else its LICENSE/README). Its own --production
// flag reads only the root package.json, which in this npm-workspaces tree has no
// dependencies (they are hoisted from apps/* and packages/*), so it would list nothing;
// the production set is passed to it with --includePackages instead.
// Writes bench/results/licences.json and prints a summary. Exit code 1 when a production
// dependency can only be used under a strong copyleft licence (GPL, AGPL, LGPL, EUPL, SSPL,
// OSL); weak copyleft (MPL, EPL, CDDL, …) and undeclared licences are listed as warnings.
import { execFileSync } from "node:child_process";
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const checkerBin = path.join(repoRoot, "node_modules", ".bin", "license-checker-rseidelsohn");

// --- classification ----------------------------------------------------------------------
const PERMISSIVE = 0;
const WEAK = 1; // warn
const UNKNOWN = 2; // warn: nothing usable declared, read the package yourself
const STRONG = 3; // fail
const LEVEL_NAMES = ["permissive", "weak copyleft", "unknown", "strong copyleft"];

const STRONG_RE = /^(A?GPL|LGPL|EUPL|SSPL|OSL|RPL|Sleepycat)\b/i;
const WEAK_RE = /^(MPL|EPL|CDDL|CPL|MS-RL|CC-BY-SA|CECILL|APSL)\b/i;

function levelOfId(id) {
  const clean = id.replace(/\*$/, "").replace(/\+$/, "");
  if (/^(UNKNOWN|UNLICENSED|Custom:|SEE LICENSE)/i.test(clean) || clean === "") return UNKNOWN;
  if (STRONG_RE.test(clean) || /^GPL/i.test(clean)) return STRONG;
  if (WEAK_RE.test(clean)) return WEAK;
  return PERMISSIVE;
}

/**
 * The least restrictive way to take a package under an SPDX expression: OR takes the milder
 * alternative, AND the stronger part, WITH keeps the licence's own level. Anything that does
 * not parse counts as unknown.
 */
function levelOfExpression(expr) {
  const tokens = String(expr).match(/\(|\)|[^\s()]+/g) ?? [];
  let i = 0;
  const peek = () => tokens[i];
  const factor = () => {
    if (peek() === "(") {
      i++;
      const v = orExpr();
      if (tokens[i++] !== ")") throw new Error("unbalanced");
      return v;
    }
    const id = tokens[i++];
    if (id === undefined) throw new Error("empty");
    if (peek()?.toUpperCase() === "WITH") i += 2; // an exception never makes it stricter
    return levelOfId(id);
  };
  const andExpr = () => {
    let v = factor();
    while (peek()?.toUpperCase() === "AND") {
      i++;
      v = Math.max(v, factor());
    }
    return v;
  };
  const orExpr = () => {
    let v = andExpr();
    while (peek()?.toUpperCase() === "OR") {
      i++;
      v = Math.min(v, andExpr());
    }
    return v;
  };
  try {
    const v = orExpr();
    return i === tokens.length ? v : UNKNOWN;
  } catch {
    return UNKNOWN;
  }
}

// license-checker gives a string, or an array when package.json lists several licences;
// an array is read strictly (all apply) so that a gate never passes by accident.
const expressionOf = (licenses) =>
  Array.isArray(licenses) ? licenses.map((l) => `(${l})`).join(" AND ") : String(licenses ?? "UNKNOWN");

// --- the production set (npm) and its licences (license-checker) --------------------------
const prodNodes = JSON.parse(
  execFileSync("npm", ["query", ".prod"], { cwd: repoRoot, encoding: "utf8", maxBuffer: 256 * 1024 * 1024 }),
);
// The workspaces themselves (not under node_modules) are this project, not dependencies.
const production = [
  ...new Set(
    prodNodes.filter((n) => n.location?.includes("node_modules/")).map((n) => `${n.name}@${n.version}`),
  ),
].sort();

const tmp = mkdtempSync(path.join(tmpdir(), "waymark-licences-"));
let found;
try {
  const out = path.join(tmp, "licences.json");
  execFileSync(
    checkerBin,
    ["--start", repoRoot, "--json", "--out", out, "--includePackages", production.join(";")],
    { cwd: repoRoot, stdio: ["ignore", "ignore", "inherit"], maxBuffer: 256 * 1024 * 1024 },
  );
  found = JSON.parse(readFileSync(out, "utf8"));
} finally {
  rmSync(tmp, { recursive: true, force: true });
}

const rel = (p) => (p ? path.relative(repoRoot, p) : null);
const packages = production.map((id) => {
  const info = found[id];
  const at = id.lastIndexOf("@");
  const licenses = info ? expressionOf(info.licenses) : "NOT FOUND";
  const level = info ? levelOfExpression(licenses) : UNKNOWN;
  return {
    name: id.slice(0, at),
    version: id.slice(at + 1),
    licenses,
    guessed: /\*/.test(licenses),
    level: LEVEL_NAMES[level],
    // A dual licence whose copyleft alternative is not needed: taken under the milder one.
    copyleftAlternative: level === PERMISSIVE && /GPL|EUPL|MPL|EPL/i.test(licenses),
    repository: info?.repository ?? null,
    publisher: info?.publisher ?? null,
    licenseFile: rel(info?.licenseFile),
  };
});

const byLicence = {};
for (const p of packages) byLicence[p.licenses] = (byLicence[p.licenses] ?? 0) + 1;
const list = (level) =>
  packages.filter((p) => p.level === level).map((p) => `${p.name}@${p.version} (${p.licenses})`);
const failures = list("strong copyleft");
const warnings = { weakCopyleft: list("weak copyleft"), unknown: list("unknown") };
const dual = packages
  .filter((p) => p.copyleftAlternative)
  .map((p) => `${p.name}@${p.version} (${p.licenses})`);

const report = {
  generatedAt: new Date().toISOString(),
  tool: "license-checker-rseidelsohn (licence of each package) over `npm query .prod` (the production set)",
  rule: "fail: GPL, AGPL, LGPL, EUPL, SSPL, OSL with no permissive alternative; warn: MPL, EPL, CDDL and other weak copyleft, and undeclared licences",
  productionPackages: packages.length,
  byLicence: Object.fromEntries(Object.entries(byLicence).sort((a, b) => b[1] - a[1])),
  failures,
  warnings,
  dualLicensedTakenUnderPermissive: dual,
  packages,
};
const outDir = path.join(repoRoot, "bench", "results");
mkdirSync(outDir, { recursive: true });
writeFileSync(path.join(outDir, "licences.json"), `${JSON.stringify(report, null, 2)}\n`);

console.log(`Licences of ${packages.length} production dependencies:`);
for (const [l, n] of Object.entries(report.byLicence)) console.log(`  ${String(n).padStart(4)}  ${l}`);
if (dual.length) console.log(`Dual-licensed, taken under the permissive alternative: ${dual.join(", ")}`);
if (warnings.weakCopyleft.length) console.log(`WARN weak copyleft: ${warnings.weakCopyleft.join(", ")}`);
if (warnings.unknown.length)
  console.log(`WARN no licence declared (review by hand): ${warnings.unknown.join(", ")}`);
if (failures.length) console.log(`FAIL strong copyleft: ${failures.join(", ")}`);
else console.log("No production dependency is under a strong copyleft licence.");
console.log(`Wrote ${rel(path.join(outDir, "licences.json"))}`);
process.exitCode = failures.length ? 1 : 0;
