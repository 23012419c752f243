import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import path from "node:path";

/** Debian's interpreter, where python3-scipy and python3-statsmodels are installed. */
export const PYTHON = process.env.PYTHON ?? "/usr/bin/python3";

const here = path.dirname(fileURLToPath(import.meta.url));
const FIXTURES = path.join(here, "fixtures");

/**
 * `live` (set by `npm run reference:regen -w @waymark/tests`) runs the python generators,
 * prints how their answers differ from the committed fixtures and rewrites the fixtures.
 * Otherwise the suites read the fixtures and need no python libraries at all.
 */
const LIVE = process.env.WAYMARK_REFERENCE === "live";

/** What a fixture file holds: the generator's answer and enough to tell whether it is stale. */
interface Fixture<T> {
  generator: string;
  regenerate: string;
  python: string;
  versions: unknown;
  payloadSha256: string;
  answer: T;
}

const sha256 = (payload: unknown) => createHash("sha256").update(JSON.stringify(payload)).digest("hex");

/**
 * The reference answer of a generator in tests/reference/python for this payload. It comes from
 * tests/reference/fixtures/<name>.json, written by the same generator (recorded with its library
 * versions); JSON keeps every double exactly, so a fixture equals the live answer bit for bit.
 * A payload that no longer matches the one the fixture was made from fails loudly.
 */
export function runPython<T extends { versions?: unknown }>(script: string, payload: unknown): T {
  const file = path.join(FIXTURES, script.replace(/_runner\.py$/, "") + ".json");
  const hash = sha256(payload);
  if (LIVE) return regenerate<T>(script, payload, file, hash);
  if (!existsSync(file)) {
    throw new Error(
      `${path.relative(process.cwd(), file)} is missing: run npm run reference:regen -w @waymark/tests`,
    );
  }
  const fixture = JSON.parse(readFileSync(file, "utf8")) as Fixture<T>;
  if (fixture.payloadSha256 !== hash) {
    throw new Error(
      `${path.basename(file)} was generated from other inputs than this test sends to ${script}; ` +
        "run npm run reference:regen -w @waymark/tests and review the diff it prints",
    );
  }
  return fixture.answer;
}

function regenerate<T extends { versions?: unknown }>(
  script: string,
  payload: unknown,
  file: string,
  hash: string,
): T {
  const out = execFileSync(PYTHON, [path.join(here, "python", script)], {
    input: JSON.stringify(payload),
    encoding: "utf8",
    maxBuffer: 256 * 1024 * 1024,
  });
  const answer = JSON.parse(out) as T;
  const pythonVersion = execFileSync(PYTHON, ["-c", "import sys; print(sys.version.split()[0])"], {
    encoding: "utf8",
  }).trim();
  if (existsSync(file)) {
    const old = JSON.parse(readFileSync(file, "utf8")) as Fixture<T>;
    const d = diff(old.answer, answer);
    console.log(
      `${path.basename(file)}: ${old.payloadSha256 === hash ? "same inputs" : "NEW INPUTS"}; ` +
        `versions ${JSON.stringify(old.versions)} → ${JSON.stringify(answer.versions)}; ` +
        `${d.changed} values changed (largest relative change ${d.worst.toExponential(2)}${d.where ? ` at ${d.where}` : ""}), ` +
        `${d.shape} structural differences`,
    );
  } else {
    console.log(`${path.basename(file)}: new fixture`);
  }
  const fixture: Fixture<T> = {
    generator: `tests/reference/python/${script}`,
    regenerate: "npm run reference:regen -w @waymark/tests",
    python: pythonVersion,
    versions: answer.versions ?? null,
    payloadSha256: hash,
    answer,
  };
  mkdirSync(FIXTURES, { recursive: true });
  writeFileSync(file, JSON.stringify(fixture, null, 1) + "\n");
  return answer;
}

/** Counts numbers that differ between two answers and the largest relative change among them. */
function diff(a: unknown, b: unknown, where = "", acc = { changed: 0, worst: 0, where: "", shape: 0 }) {
  if (typeof a === "number" && typeof b === "number") {
    if (!Object.is(a, b)) {
      acc.changed++;
      const rel = Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), Number.MIN_VALUE);
      if (rel > acc.worst || !acc.where) [acc.worst, acc.where] = [rel, where];
    }
  } else if (a && b && typeof a === "object" && typeof b === "object") {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of keys) {
      const [x, y] = [(a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]];
      if (x === undefined || y === undefined) acc.shape++;
      else diff(x, y, `${where}/${k}`, acc);
    }
  } else if (a !== b) acc.shape++;
  return acc;
}
