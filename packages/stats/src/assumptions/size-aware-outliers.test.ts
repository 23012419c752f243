import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { describe, expect, it } from "vitest";
import { quantileSorted } from "../descriptives/quantile.js";
import { grubbsCritical, sizeAwareOutliers } from "./size-aware-outliers.js";

describe("grubbsCritical", () => {
  it("matches the formula evaluated with scipy 1.10.1 t.ppf (and Grubbs 1969's table: 1.155, 1.715, 2.290, 2.709 for n = 3, 5, 10, 20; from memory)", () => {
    const scipy: [number, number][] = [
      [3, 1.1543048513440386],
      [5, 1.7150373121065823],
      [10, 2.28995408447961],
      [20, 2.708245645436111],
      [50, 3.1282473343306383],
      [100, 3.384082902288351],
    ];
    for (const [n, g] of scipy) expect(grubbsCritical(n)).toBeCloseTo(g, 8);
  });
});

describe("sizeAwareOutliers", () => {
  it("flags a value beyond the fence for its n, with the reading as code and params (hand computation: z = 17.8/6.3214 = 2.816 > 2.290)", () => {
    const r = sizeAwareOutliers([
      { name: "A", values: [10, 11, 9, 10, 12, 10, 11, 9, 10, 30], rows: [2, 3, 4, 5, 6, 7, 8, 9, 10, 11] },
      { name: "B", values: [1, 2, 3, 4, 5] },
      { name: "C", values: [1, 2] },
    ]);
    const a = r.groups[0];
    expect(a?.flaggedCount).toBe(1);
    expect(a?.flagged[0]).toMatchObject({ value: 30, row: 11 });
    expect(a?.flagged[0]?.z).toBeCloseTo(17.8 / Math.sqrt(359.6 / 9), 12);
    expect(a?.reading).toMatchObject({
      code: "outliers.group-flagged",
      params: { group: "A", n: 10, count: 1 },
    });
    expect(r.groups[1]?.reading.code).toBe("outliers.group-none");
    expect(r.groups[2]?.reading.code).toBe("outliers.group-too-small");
    expect(r.summary).toMatchObject({ code: "outliers.some-groups", params: { groups: ["A"] } });
  });

  it("flags a normal group about 5% of the time whatever its size, unlike the fixed 3 IQR fence (simulation; Grubbs 1969; the 3 IQR rate at n = 5 is 13.5% in the methods notes, measured)", () => {
    const rng = xoroshiro128plus(2026);
    const normal = () => {
      const u = 1 - uniformFloat64(rng);
      return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniformFloat64(rng));
    };
    const R = 4000;
    const se = Math.sqrt((0.05 * 0.95) / R);
    for (const n of [5, 10, 20, 50]) {
      let flagged = 0;
      let beyond3Iqr = 0;
      for (let r = 0; r < R; r++) {
        const values = Array.from({ length: n }, normal);
        const rep = sizeAwareOutliers([{ name: "A", values }]);
        if ((rep.groups[0]?.flaggedCount ?? 0) > 0) flagged++;
        const s = Float64Array.from(values).sort();
        const q1 = quantileSorted(s, 0.25);
        const q3 = quantileSorted(s, 0.75);
        if ((s[0] as number) < q1 - 3 * (q3 - q1) || (s[n - 1] as number) > q3 + 3 * (q3 - q1)) beyond3Iqr++;
      }
      // At most α by the Bonferroni bound, and close to it.
      expect(flagged / R).toBeLessThan(0.05 + 3 * se);
      expect(flagged / R).toBeGreaterThan(0.05 - 3 * se - 0.01);
      if (n === 5) expect(Math.abs(beyond3Iqr / R - 0.135)).toBeLessThan(3 * Math.sqrt((0.135 * 0.865) / R));
    }
  });
});
