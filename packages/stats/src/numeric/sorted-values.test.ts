import { describe, expect, it } from "vitest";
import { prepareSample } from "./prepare-sample.js";
import { sortedValues } from "./sorted-values.js";

describe("sortedValues", () => {
  it("counting sort (decimal data) and comparison sort give the same doubles", () => {
    const values = Array.from({ length: 5000 }, (_, i) => (((i * 7919) % 3001) - 1200) / 100);
    const s = prepareSample([{ name: "A", values }]);
    const g = s.groups[0]!;
    expect(g.integerDivisor).toBe(100);
    const expected = Float64Array.from(g.centred).sort();
    expect(Array.from(sortedValues(g))).toEqual(Array.from(expected));
    expect(sortedValues(g)).toBe(sortedValues(g)); // cached
  });

  it("falls back to the built-in sort for full-precision doubles", () => {
    const values = Array.from({ length: 300 }, (_, i) => Math.sin(i) * Math.PI);
    const g = prepareSample([{ name: "A", values }]).groups[0]!;
    expect(g.integerDivisor).toBeUndefined();
    const out = sortedValues(g);
    for (let i = 1; i < out.length; i++) expect(out[i]!).toBeGreaterThanOrEqual(out[i - 1]!);
  });
});
