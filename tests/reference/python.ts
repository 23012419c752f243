import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import path from "node:path";

/** Debian's interpreter, where python3-scipy and python3-statsmodels are installed. */
export const PYTHON = process.env.PYTHON ?? "/usr/bin/python3";

const here = path.dirname(fileURLToPath(import.meta.url));

/**
 * Runs a reference script from tests/reference/python with a JSON payload on stdin and
 * returns its JSON answer. The scripts call scipy/statsmodels and report their versions.
 */
export function runPython<T>(script: string, payload: unknown): T {
  const out = execFileSync(PYTHON, [path.join(here, "python", script)], {
    input: JSON.stringify(payload),
    encoding: "utf8",
    maxBuffer: 256 * 1024 * 1024,
  });
  return JSON.parse(out) as T;
}
