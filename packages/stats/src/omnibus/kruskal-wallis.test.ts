import { describe, expect, it } from "vitest";
import { kruskalWallis } from "./kruskal-wallis.js";

describe("kruskalWallis", () => {
  it("matches a hand computation", () => {
    // Ranks 1–3 vs 4–6: H = 12/(6·7)·(3·1.5² + 3·1.5²) = 3.857142…; scipy 1.10.1 kruskal p = 0.049534613435626915.
    const k = kruskalWallis([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 5, 6] },
    ]);
    if (!k.available) throw new Error(k.reason);
    expect(k.H).toBeCloseTo(27 / 7, 14);
    expect(k.p).toBeCloseTo(0.049534613435626915, 14);
    expect(k.epsilonSquared).toBeCloseTo(27 / 7 / 5, 14);
    expect(k.tieCorrection).toBe(1);
    expect(k.meanRanks).toEqual([
      { group: "A", n: 3, meanRank: 2 },
      { group: "B", n: 3, meanRank: 5 },
    ]);
  });

  it("adds a seeded permutation p for small samples, close to the exact permutation p", () => {
    // Exact: of the C(6,3) = 20 splits, 2 reach H = 27/7, so p = 0.1.
    const a = kruskalWallis([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 5, 6] },
    ]);
    const b = kruskalWallis([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [4, 5, 6] },
    ]);
    if (!a.available || !a.permutation || !b.available) throw new Error("no permutation");
    expect(Math.abs(a.permutation.p - 0.1)).toBeLessThan(4 * a.permutation.se);
    expect(b.permutation).toEqual(a.permutation); // deterministic
    expect(a.permutation.iterations).toBe(10_000);
  });

  it("applies the tie correction", () => {
    // Values 1,1,2 | 2,3,3: midranks 1.5,1.5,3.5 | 3.5,5.5,5.5; ties of 2 three times: C = 1 − 18/210.
    const k = kruskalWallis(
      [
        { name: "A", values: [1, 1, 2] },
        { name: "B", values: [2, 3, 3] },
      ],
      { permutation: false },
    );
    if (!k.available) throw new Error(k.reason);
    expect(k.tieCorrection).toBeCloseTo(1 - 18 / 210, 15);
    const raw = (12 / 42) * (3 * (6.5 / 3 - 3.5) ** 2 + 3 * (14.5 / 3 - 3.5) ** 2);
    expect(k.H).toBeCloseTo(raw / (1 - 18 / 210), 13);
    expect(k.permutation).toBeUndefined();
  });

  it("is unavailable when every value is tied", () => {
    expect(
      kruskalWallis([
        { name: "A", values: [2, 2] },
        { name: "B", values: [2, 2, 2] },
      ]),
    ).toEqual({
      available: false,
      reason: "All values are tied, so the ranks carry no information and H is undefined",
    });
  });

  it("gives log10 p where p underflows: χ²(2) has the closed form P(X > h) = exp(−h/2) (Abramowitz & Stegun 26.4.21, from memory)", () => {
    // Three groups of 1000 that do not overlap: H ≈ 2665, p ≈ 10^−579.
    const k = kruskalWallis(
      [0, 1, 2].map((g) => ({ name: `G${g}`, values: Array.from({ length: 1000 }, (_, i) => g * 1000 + i) })),
    );
    if (!k.available) throw new Error(k.reason);
    expect(k.p).toBe(0);
    const closed = -k.H / 2 / Math.LN10;
    expect(closed).toBeLessThan(-500);
    expect(Math.abs(k.log10p - closed) / Math.abs(closed)).toBeLessThan(1e-12);
  });
});
