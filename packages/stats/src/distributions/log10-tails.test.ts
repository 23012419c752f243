import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { fSf } from "./f.js";
import { log10ChiSquareSf, log10FSf, log10NormalSf } from "./log10-tails.js";

interface Row {
  x?: number;
  z?: number;
  df?: number;
  df1?: number;
  df2?: number;
  log10: number;
  source: string;
}
const fixture = JSON.parse(
  readFileSync(new URL("../../test/fixtures/log10-tails/expected.json", import.meta.url), "utf8"),
) as { scipy: string; cases: { f: Row[]; chiSquare: Row[]; normal: Row[] } };

// Relative agreement of log10 p: 1e-12 keeps about 12 significant digits of the exponent.
const close = (a: number, b: number) => Math.abs(a - b) / Math.max(1, Math.abs(b));

describe("log10 upper tails", () => {
  for (const c of fixture.cases.f) {
    it(`F(${c.df1}, ${c.df2}) at ${c.x}: log10 p = ${c.log10} (${c.source}, scipy ${fixture.scipy})`, () => {
      expect(close(log10FSf(c.x as number, c.df1 as number, c.df2 as number), c.log10)).toBeLessThan(1e-11);
    });
  }
  for (const c of fixture.cases.chiSquare) {
    it(`χ²(${c.df}) at ${c.x}: log10 p = ${c.log10} (${c.source}, scipy ${fixture.scipy})`, () => {
      expect(close(log10ChiSquareSf(c.x as number, c.df as number), c.log10)).toBeLessThan(1e-11);
    });
  }
  for (const c of fixture.cases.normal) {
    it(`normal at ${c.z}: log10 p = ${c.log10} (${c.source}, scipy ${fixture.scipy})`, () => {
      expect(close(log10NormalSf(c.z as number), c.log10)).toBeLessThan(1e-11);
    });
  }

  it("is continuous where the direct tail hands over to the continued fraction (property)", () => {
    // Find f where fSf crosses 1e-280 for F(3, 120) and compare both sides.
    let lo = 1;
    let hi = 1e6;
    for (let i = 0; i < 200; i++) {
      const mid = Math.sqrt(lo * hi);
      if (fSf(mid, 3, 120) > 1e-280) lo = mid;
      else hi = mid;
    }
    expect(Math.abs(log10FSf(lo, 3, 120) - log10FSf(hi, 3, 120))).toBeLessThan(1e-9);
    expect(Math.abs(log10NormalSf(30) - log10NormalSf(30 + 1e-12))).toBeLessThan(1e-9);
  });

  it("edges: p = 1 below the support, −Infinity only for an infinite statistic", () => {
    expect(log10FSf(0, 2, 3)).toBe(0);
    expect(log10ChiSquareSf(-1, 2)).toBe(0);
    expect(log10FSf(Infinity, 2, 3)).toBe(-Infinity);
  });
});
