import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { main } from "./main.js";

const dir = mkdtempSync(path.join(tmpdir(), "waymark-cli-"));
function file(name: string, text: string): string {
  const p = path.join(dir, name);
  writeFileSync(p, text, "utf8");
  return p;
}

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(argv, { stdout: (t) => (out += t), stderr: (t) => (err += t) });
  return { code, out, err };
}

const good = file(
  "good.csv",
  '\ufeff"Orchard row";"Fruit mass (kg)";note\n"Row A";4.1;x\n"Row A";4.5;\n"Row A";3.9;\n"Row B";5.0;\n"Row B";5.6;\n"Row B";NA;\n"Row B";4.9;\n"Ärger";4.6;\n"Ärger";4.3;\n"Ärger";5.2;\n',
);

describe("waymark-stats analyze", () => {
  it("prints the analyze() JSON with --json (semicolon file, BOM, quoted and non-ASCII names)", async () => {
    const r = await run("analyze", good, "--group", "Orchard row", "--outcome", "Fruit mass (kg)", "--json");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    expect(out.groups.map((g: { name: string }) => g.name)).toEqual(["Row A", "Row B", "Ärger"]);
    expect(out.groups[1].missing).toBe(1);
    expect(out.groups[1].n).toBe(3);
    expect(r.err).toContain("waymark-stats: warning: 1 missing value was excluded");
  });

  it("prints a text report without --json", async () => {
    const r = await run("analyze", good, "--group", "Orchard row", "--outcome", "Fruit mass (kg)");
    expect(r.code).toBe(0);
    expect(r.out).toContain("Primary test, from the design answers:");
    expect(r.out).toContain("Is there a difference?");
  });

  const oneLine = (r: { err: string }) => {
    expect(r.err.trimEnd().split("\n")).toHaveLength(1);
    expect(r.err.startsWith("waymark-stats: ")).toBe(true);
  };

  it("missing file → exit 1, one line", async () => {
    const r = await run("analyze", path.join(dir, "nope.csv"), "--group", "g", "--outcome", "y");
    expect(r.code).toBe(1);
    oneLine(r);
    expect(r.err).toContain("no such file");
  });

  it("missing column → exit 1, lists the columns", async () => {
    const r = await run("analyze", good, "--group", "Row", "--outcome", "Fruit mass (kg)");
    expect(r.code).toBe(1);
    oneLine(r);
    expect(r.err).toContain("the columns are 'Orchard row', 'Fruit mass (kg)', 'note'");
  });

  it("non-numeric outcome → exit 1, names CSV line numbers", async () => {
    const f = file("bad.csv", "g,y\nA,1\nA,2\nB,three\nB,4\nB,5,5\n");
    const r = await run("analyze", f, "--group", "g", "--outcome", "y");
    expect(r.code).toBe(1);
    oneLine(r);
    expect(r.err).toContain('line 4: "three" is not a number');
  });

  it("infinite values → exit 1", async () => {
    const r = await run(
      "analyze",
      file("inf.csv", "g,y\nA,1\nA,2\nB,Infinity\nB,4\n"),
      "--group",
      "g",
      "--outcome",
      "y",
    );
    expect(r.code).toBe(1);
    oneLine(r);
    expect(r.err).toContain("line 4");
  });

  it("fewer than two groups → exit 1", async () => {
    const r = await run("analyze", file("one.csv", "g,y\nA,1\nA,2\n"), "--group", "g", "--outcome", "y");
    expect(r.code).toBe(1);
    oneLine(r);
    expect(r.err).toContain("only one group ('A')");
  });

  it("a group with fewer than two values → exit 1", async () => {
    const r = await run(
      "analyze",
      file("small.csv", "g,y\nA,1\nA,2\nB,3\n"),
      "--group",
      "g",
      "--outcome",
      "y",
    );
    expect(r.code).toBe(1);
    oneLine(r);
    expect(r.err).toContain("group 'B' has 1");
  });

  it("all values identical → exit 1", async () => {
    const r = await run(
      "analyze",
      file("same.csv", "g,y\nA,2\nA,2\nB,2.0\nB,2\n"),
      "--group",
      "g",
      "--outcome",
      "y",
    );
    expect(r.code).toBe(1);
    oneLine(r);
    expect(r.err).toContain("none of the tests can run");
  });

  it("zero variance in a group → warning on stderr, result on stdout, exit 0", async () => {
    const r = await run(
      "analyze",
      file("zero.csv", "g,y\nA,1\nA,2\nA,3\nB,5\nB,5\nC,2\nC,4\n"),
      "--group",
      "g",
      "--outcome",
      "y",
      "--json",
    );
    expect(r.code).toBe(0);
    expect(r.err).toContain("warning: Zero variance in group 'B'");
    expect(JSON.parse(r.out).welch.available).toBe(false);
  });

  it("usage errors → exit 2, one line", async () => {
    for (const argv of [
      [],
      ["frobnicate"],
      ["analyze", good],
      ["analyze", good, "--group", "g"],
      ["analyze", good, "--group", "g", "--outcome", "y", "--alpha", "2"],
      ["analyze", good, "--bogus"],
      ["analyze", good, "--group", "g", "--outcome", "y", "--adjust", "sidak"],
    ]) {
      const r = await run(...argv);
      expect(r.code, argv.join(" ")).toBe(2);
      oneLine(r);
    }
  });

  it("--help and --version", async () => {
    expect((await run("--help")).out).toContain("waymark-stats analyze FILE.csv");
    expect((await run("--version")).out).toMatch(/^waymark-stats \d+\.\d+\.\d+\n$/);
  });
});

describe("waymark-stats power", () => {
  it("--n gives the power of the F test (vs scipy 1.10.1 ncf.sf(f.ppf(.95, 2, 57), 2, 57, 60·0.4²))", async () => {
    const r = await run("power", "--groups", "3", "--effect-f", "0.4", "--n", "20", "--json");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    expect(out).toMatchObject({ k: 3, f: 0.4, alpha: 0.05, nPerGroup: 20, totalN: 60 });
    expect(Math.abs(out.power - 0.7757304350632471)).toBeLessThan(1e-8);
  });

  it("--power gives the smallest n per group (scipy 1.10.1 ncf: n = 21 → 0.79782, n = 22 → above 0.8)", async () => {
    const out = JSON.parse(
      (await run("power", "--groups", "3", "--effect-f", "0.4", "--power", "0.8", "--json")).out,
    );
    expect(out.nPerGroup).toBe(22);
    expect(out.power).toBeGreaterThan(0.8);
  });

  it("needs exactly one of --n and --power", async () => {
    const r = await run("power", "--groups", "3", "--effect-f", "0.25");
    expect(r.code).toBe(2);
    expect(r.err).toContain("exactly one of --n");
  });
});
