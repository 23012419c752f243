import { describe, expect, it } from "vitest";
import { simulatedPower } from "./simulated-power.js";

describe("simulated power", () => {
  it("is reproducible: the same seed gives the same answer, another seed differs", () => {
    const spec = { means: [0, 0.5, 1], sds: [1, 1, 2], n: 8, simulations: 60 };
    const a = simulatedPower({ ...spec, seed: 7 });
    expect(simulatedPower({ ...spec, seed: 7 })).toEqual(a);
    expect(simulatedPower({ ...spec, seed: 8 }).welch.power).not.toBe(a.welch.power);
  });

  it("under equal means the rejection rate is α within 4 Monte-Carlo standard errors", () => {
    const r = simulatedPower({
      means: [5, 5, 5],
      sds: [1, 2, 3],
      n: [10, 15, 20],
      simulations: 500,
      seed: 11,
    });
    const se = Math.sqrt((0.05 * 0.95) / 500);
    expect(Math.abs(r.welch.power - 0.05)).toBeLessThan(4 * se);
    expect(Math.abs(r.kruskalWallis.power - 0.05)).toBeLessThan(4 * se);
    expect(r.welch.standardError).toBeCloseTo(Math.sqrt((r.welch.power * (1 - r.welch.power)) / 500), 15);
  });

  it("input errors name the problem", () => {
    expect(() => simulatedPower({ means: [0, 1], sds: [1], n: 5 })).toThrow(/one SD per group/);
    expect(() => simulatedPower({ means: [0, 1], sds: [1, 0], n: 5 })).toThrow(/group 2 has 0/);
  });
});
