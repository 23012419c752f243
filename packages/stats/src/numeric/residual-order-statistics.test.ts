import { describe, expect, it } from "vitest";
import { pooledResiduals } from "./pooled-residuals.js";
import { prepareSample } from "./prepare-sample.js";
import { residualOrderStatistics } from "./residual-order-statistics.js";

describe("residualOrderStatistics", () => {
  it("equals the full sort of pooled residuals at the requested ranks", () => {
    for (const decimals of [true, false]) {
      const groups = [0, 1, 2, 3].map((g) => ({
        name: `G${g}`,
        values: Array.from({ length: 3000 + 500 * g }, (_, i) => {
          const x = Math.sin(i * 12.9898 + g * 78.233) * (1 + g) + g;
          return decimals ? Math.round(x * 100) / 100 : x;
        }),
      }));
      const sample = prepareSample(groups);
      const full = pooledResiduals(sample);
      const ranks = [1, 2, 17, 500, 4001, 9999, 10000, full.length - 1, full.length];
      expect(residualOrderStatistics(sample, ranks)).toEqual(ranks.map((r) => full[r - 1]));
    }
  });

  it("handles heavy ties", () => {
    const sample = prepareSample([
      { name: "A", values: [1, 1, 1, 2, 2] },
      { name: "B", values: [5, 5, 6] },
    ]);
    const full = pooledResiduals(sample);
    expect(residualOrderStatistics(sample, [1, 2, 3, 4, 5, 6, 7, 8])).toEqual(Array.from(full));
  });
});
