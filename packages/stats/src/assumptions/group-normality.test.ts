import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { describe, expect, it } from "vitest";
import { pooledResiduals } from "../numeric/pooled-residuals.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { groupNormality } from "./group-normality.js";
import { shapiroWilk } from "./shapiro-wilk.js";

const X = [12.1, 9.8, 11.4, 10.2, 15.9, 10.7, 9.9, 11.1, 10.4, 13.3, 10.0, 10.8];

describe("groupNormality", () => {
  it("W and p per group on standardized residuals (scipy 1.10.1 stats.shapiro on (x − mean)/sd: W = 0.79287064, p = 0.0077826115)", () => {
    const r = groupNormality([
      { name: "A", values: X },
      { name: "B", values: [1, 2] },
      { name: "C", values: [4, 4, 4] },
    ]);
    const a = r.groups[0];
    expect(a?.W).toBeCloseTo(0.7928706407546997, 6); // scipy returns W as float32
    expect(a?.p).toBeCloseTo(0.007782611530274153, 6);
    expect(a?.reading.code).toBe("normality.group-departs");
    expect(a?.reading.params).toMatchObject({ group: "A", n: 12 });
    expect(a?.reading.text).toMatch(
      /group 'A' depart from a normal shape \(Shapiro–Wilk W = 0\.793, p = \.008\)/,
    );
    expect(r.groups[1]?.reading.code).toBe("normality.group-too-small");
    expect(r.groups[2]?.reading.code).toBe("normality.group-constant");
    expect(r.summary).toMatchObject({ code: "normality.some-depart", params: { groups: ["A"], checked: 1 } });
  });

  it("standardizing changes nothing for Shapiro–Wilk, which is location-scale invariant (Shapiro & Wilk 1965)", () => {
    const r = groupNormality([
      { name: "A", values: X },
      { name: "B", values: X.map((x) => 3 * x + 100) },
    ]);
    const raw = shapiroWilk(Float64Array.from(X).sort());
    if (!raw.available) throw new Error(raw.reason);
    for (const g of r.groups) expect(g.W).toBeCloseTo(raw.W, 12);
  });

  it("normal groups with SDs 1, 3 and 10: per-group rejection stays near α while the pooled residuals reject far more often (scale mixture; Royston 1995 for the test's size)", () => {
    const rng = xoroshiro128plus(77);
    const normal = () => {
      const u = 1 - uniformFloat64(rng);
      return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniformFloat64(rng));
    };
    const R = 400;
    let perGroup = 0;
    let pooled = 0;
    for (let r = 0; r < R; r++) {
      const groups = [1, 3, 10].map((sd, g) => ({
        name: `G${g}`,
        values: Array.from({ length: 30 }, () => 50 + sd * normal()),
      }));
      for (const g of groupNormality(groups).groups) if ((g.p as number) < 0.05) perGroup++;
      const res = Float64Array.from(pooledResiduals(prepareSample(groups))).sort();
      const sw = shapiroWilk(res);
      if (sw.available && sw.p < 0.05) pooled++;
    }
    const rate = perGroup / (3 * R);
    expect(Math.abs(rate - 0.05)).toBeLessThan(3 * Math.sqrt((0.05 * 0.95) / (3 * R)));
    expect(pooled / R).toBeGreaterThan(0.5);
  });
});
