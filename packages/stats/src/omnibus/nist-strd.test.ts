import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { oneWayAnova } from "./one-way-anova.js";

// NIST StRD one-way ANOVA datasets (public domain; copied with a README into test/fixtures).
const dir = path.join(path.dirname(fileURLToPath(import.meta.url)), "../../test/fixtures/nist-strd-anova");
const files = readdirSync(dir)
  .filter((f) => f.endsWith(".dat"))
  .sort();

interface Certified {
  ssBetween: number;
  ssWithin: number;
  F: number;
  rSquared: number;
  df1: number;
  df2: number;
}

/** Certified values from lines 41–47 and the data from line 61, as the file header says. */
function read(file: string): { certified: Certified; groups: { name: string; values: string[] }[] } {
  const lines = readFileSync(path.join(dir, file), "utf8").split(/\r?\n/);
  const cert = lines.slice(40, 47);
  const between = (cert.find((l) => /^Between/.test(l)) ?? "").trim().split(/\s+/);
  const within = (cert.find((l) => /^Within/.test(l)) ?? "").trim().split(/\s+/);
  const r2 = /R-Squared\s+(\S+)/.exec(cert.join("\n"))?.[1];
  const certified = {
    df1: Number(between[2]),
    ssBetween: Number(between[3]),
    F: Number(between[5]),
    df2: Number(within[2]),
    ssWithin: Number(within[3]),
    rSquared: Number(r2),
  };
  const byGroup = new Map<string, string[]>();
  for (const line of lines.slice(60)) {
    const [g, y] = line.trim().split(/\s+/);
    if (g === undefined || y === undefined) continue;
    byGroup.set(g, [...(byGroup.get(g) ?? []), y]);
  }
  return { certified, groups: [...byGroup].map(([name, values]) => ({ name, values })) };
}

/** Log relative error (McCullough 1998), capped at 15 digits. */
function lre(x: number, certified: number): number {
  if (x === certified) return 15;
  return Math.min(15, -Math.log10(Math.abs(x - certified) / Math.abs(certified)));
}

const table: Record<string, Record<string, number>> = {};
afterAll(() => {
  console.log("NIST StRD one-way ANOVA, LRE (digits agreeing with the certified values):");
  console.table(table);
});

describe("NIST StRD one-way ANOVA: LRE ≥ 12 for F, SS between, SS within and R² on all 11 datasets", () => {
  it("finds the eleven files", () => expect(files).toHaveLength(11));
  for (const file of files) {
    it(file, () => {
      const { certified, groups } = read(file);
      const a = oneWayAnova(groups);
      if (!a.available) throw new Error(a.reason);
      expect(a.df1).toBe(certified.df1);
      expect(a.df2).toBe(certified.df2);
      const scores = {
        F: lre(a.F, certified.F),
        ssBetween: lre(a.ssBetween, certified.ssBetween),
        ssWithin: lre(a.ssWithin, certified.ssWithin),
        rSquared: lre(a.rSquared, certified.rSquared),
      };
      table[file.replace(".dat", "")] = Object.fromEntries(
        Object.entries(scores).map(([k, v]) => [k, Number(v.toFixed(1))]),
      );
      for (const v of Object.values(scores)) expect(v).toBeGreaterThanOrEqual(12);
    });
    it(`${file} given as JS numbers (shortest decimal text path)`, () => {
      const { certified, groups } = read(file);
      const a = oneWayAnova(groups.map((g) => ({ name: g.name, values: g.values.map(Number) })));
      if (!a.available) throw new Error(a.reason);
      expect(lre(a.F, certified.F)).toBeGreaterThanOrEqual(12);
      expect(lre(a.ssWithin, certified.ssWithin)).toBeGreaterThanOrEqual(12);
    });
  }
});
