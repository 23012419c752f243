import { describe, expect, it } from "vitest";
import { rankBiserial } from "./rank-biserial.js";

describe("rank-biserial correlation", () => {
  it("counts ties as one half (worked by hand: U_a = 7.5 of 9 pairs)", () => {
    const r = rankBiserial([3, 4, 5], [1, 2, 4]);
    if (!r.available) throw new Error(r.reason);
    expect(r.u).toBe(7.5);
    expect(r.r).toBeCloseTo(2 / 3, 14);
  });

  it("is ±1 for complete separation, 0 for identical groups, antisymmetric", () => {
    const sep = rankBiserial([5, 6, 7], [1, 2]);
    const same = rankBiserial([1, 2, 3], [1, 2, 3]);
    const rev = rankBiserial([1, 2], [5, 6, 7]);
    if (!sep.available || !same.available || !rev.available) throw new Error("unavailable");
    expect(sep.r).toBe(1);
    expect(same.r).toBe(0);
    expect(rev.r).toBe(-1);
  });

  it("is unavailable for an empty group", () => {
    expect(rankBiserial([], [1]).available).toBe(false);
  });
});
