import { describe, expect, it } from "vitest";
import { normalQuantile } from "../distributions/normal.js";
import { qqPlot } from "./qq-plot.js";

describe("qqPlot", () => {
  it("pairs sorted residuals with Blom quantiles Φ⁻¹((i − 3/8)/(n + 1/4))", () => {
    const r = qqPlot(Float64Array.of(-1, 0, 1));
    if (!r.available) throw new Error(r.reason);
    expect(r.theoretical[0]).toBeCloseTo(normalQuantile(0.625 / 3.25), 15);
    expect(r.theoretical[1]).toBe(0);
    expect(r.residuals).toEqual([-1, 0, 1]);
  });

  it("keeps 1000 evenly spaced order statistics, both ends included, for large n", () => {
    const r = qqPlot(new Float64Array(20000).map((_, i) => i));
    if (!r.available) throw new Error(r.reason);
    expect(r.thinned).toBe(true);
    expect(r.ranks).toHaveLength(1000);
    expect(r.ranks[0]).toBe(1);
    expect(r.ranks[999]).toBe(20000);
  });
});
