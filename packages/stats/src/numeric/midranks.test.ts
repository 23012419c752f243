import { describe, expect, it } from "vitest";
import { midranks } from "./midranks.js";
import { prepareSample } from "./prepare-sample.js";

describe("midranks", () => {
  it("gives tied values the mean of their ranks (hand computation)", () => {
    const r = midranks(
      prepareSample([
        { name: "A", values: [1, 2] },
        { name: "B", values: [2, 3] },
      ]),
      true,
    );
    expect(r.rankSums).toEqual([3.5, 6.5]);
    expect(r.tieSum).toBe(6); // one tie of 2: 2³ − 2
    expect(Array.from(r.ranks as Float64Array)).toEqual([1, 2.5, 2.5, 4]);
  });

  it("computes the tie term in doubles, without integer overflow (3·10^6 tied values)", () => {
    const t = 3_000_000;
    const big = new Array<number>(t).fill(7);
    const r = midranks(
      prepareSample([
        { name: "A", values: big.slice(0, t / 2) },
        { name: "B", values: [...big.slice(t / 2), 8] },
      ]),
    );
    // t³ − t = 2.7e19 exceeds 2^63 ≈ 9.2e18; doubles keep it to 1 ulp.
    expect(r.tieSum).toBeCloseTo(t ** 3 - t, -5);
    expect(r.tieSum).toBeGreaterThan(2 ** 63);
    expect(r.rankSums[1]).toBe((t / 2) * ((t + 1) / 2) + (t + 1));
  });

  it("ranks exactly equal decimals as ties even when their doubles came from different text", () => {
    const r = midranks(
      prepareSample([
        { name: "A", values: ["0.3", "0.30"] },
        { name: "B", values: [0.3, "3e-1"] },
      ]),
    );
    expect(r.tieSum).toBe(4 ** 3 - 4);
  });
});
