import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { PYTHON } from "./python.js";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

// Our own contract check of the command line's JSON shape (tests/contract/cli-shape.py):
// every key present, every number finite. It runs the built CLI through npx from the repo root.
describe("waymark-stats CLI contract (tests/contract/cli-shape.py)", () => {
  it("passes with 0 problems", () => {
    expect(existsSync(path.join(root, "packages/stats/dist/cli/main.js")), "build @waymark/stats first").toBe(
      true,
    );
    const out = execFileSync(PYTHON, [path.join(root, "tests/contract/cli-shape.py")], {
      cwd: root,
      encoding: "utf8",
      timeout: 240_000,
    });
    expect(out).toContain("cli shape: 0 problems");
  });
});
