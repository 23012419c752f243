import { describe, expect, it } from "vitest";
import { gamesHowell } from "./games-howell.js";
import { tTwoSided } from "../distributions/t.js";

const s = (name: string, n: number, mean: number, variance: number) => ({ name, n, mean, variance });

describe("Games–Howell", () => {
  it("k = 2 reduces to Welch's t-test: q = √2·|t|, same df and p", () => {
    const a = s("A", 8, 50, 1);
    const b = s("B", 20, 53, 36);
    const r = gamesHowell([a, b]);
    const pair = r.pairs[0]!;
    if (!pair.available) throw new Error(pair.reason);
    const va = 1 / 8;
    const vb = 36 / 20;
    const t = -3 / Math.sqrt(va + vb);
    const df = (va + vb) ** 2 / (va ** 2 / 7 + vb ** 2 / 19);
    expect(pair.df).toBeCloseTo(df, 12);
    expect(pair.q).toBeCloseTo(Math.SQRT2 * Math.abs(t), 12);
    expect(Math.abs(pair.pAdj - tTwoSided(t, df))).toBeLessThan(1e-12);
    expect(pair.lower).toBeLessThan(pair.diff);
    expect(pair.upper).toBeGreaterThan(pair.diff);
  });

  it("a pair of two constant groups is unavailable (0/0 df); the other pairs still come", () => {
    const r = gamesHowell([s("A", 4, 1, 0), s("B", 5, 2, 0), s("C", 6, 3, 1.5)]);
    const [ab, ac] = r.pairs;
    expect(ab!.available).toBe(false);
    if (!ab!.available) expect(ab!.reason).toMatch(/'A' and 'B'.*0\/0/);
    expect(ac!.available).toBe(true);
    if (ac!.available) expect(ac!.df).toBeCloseTo(5, 12); // only C's variance counts: df = n_C − 1
  });

  it("needs two values per group", () => {
    expect(() => gamesHowell([s("A", 4, 1, 1), s("B", 1, 2, 0)])).toThrow(
      "Games–Howell needs at least two values in every group; group 'B' has 1",
    );
  });
});
