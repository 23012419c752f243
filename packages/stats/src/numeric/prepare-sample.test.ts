import { describe, expect, it } from "vitest";
import { StatsInputError } from "../errors.js";
import { prepareSample } from "./prepare-sample.js";

describe("prepareSample", () => {
  it("removes a common offset exactly from decimal text (the NIST SmLs07 difficulty)", () => {
    const s = prepareSample([
      { name: "A", values: ["1000000000000.4", "1000000000000.3", "1000000000000.5"] },
    ]);
    expect(s.centring).toBe("scaled-integer");
    const c = s.groups[0]?.centred as Float64Array;
    // Differences are exact tenths: 0.1 apart, not the 1.2e-4 steps of the nearest doubles.
    expect(c[0]! - c[1]!).toBe(0.1);
    expect(c[2]! - c[0]!).toBe(0.1);
  });

  it("treats a JS number as its shortest decimal text: numbers and strings give identical centred values", () => {
    const text = ["107.8681568", "107.8681465", "107.8681572", "107.8681785"];
    const a = prepareSample([{ name: "A", values: text }]);
    const b = prepareSample([{ name: "A", values: text.map(Number) }]);
    expect(Array.from(b.groups[0]!.centred)).toEqual(Array.from(a.groups[0]!.centred));
  });

  it("uses BigInt for mantissas beyond 2^53 and stays exact", () => {
    const s = prepareSample([{ name: "A", values: ["123456789012345678.5", "123456789012345678.25"] }]);
    expect(s.centring).toBe("big-integer");
    const c = s.groups[0]!.centred;
    expect(Math.abs(c[0]! - c[1]!)).toBe(0.25);
  });

  it("centres full-precision doubles in binary (one correctly rounded subtraction)", () => {
    const s = prepareSample([{ name: "A", values: [0.1 + 0.2, 1 / 3, 2 / 3] }]);
    expect(s.centring).toBe("binary");
    expect(s.offset + s.groups[0]!.centred[0]!).toBeCloseTo(0.30000000000000004, 15);
  });

  it("drops and counts missing cells", () => {
    const s = prepareSample([{ name: "A", values: [1, null, "NA", "", 2, Number.NaN, undefined, " 3 "] }]);
    expect(s.groups[0]!.centred.length).toBe(3);
    expect(s.groups[0]!.missing).toBe(5);
  });

  it("names the first offending values, with rows when given", () => {
    expect(() => prepareSample([{ name: "A", values: ["1", "x", "2", "y"], rows: [2, 3, 4, 5] }])).toThrow(
      new StatsInputError(
        "The outcome must be numeric; found 'x' in group 'A' (row 3), 'y' in group 'A' (row 5)",
      ),
    );
    expect(() => prepareSample([{ name: "B", values: [1, Infinity] }])).toThrow(
      /must be finite; found 'Infinity' in group 'B' \(value 2\)/,
    );
    expect(() => prepareSample([{ name: "B", values: ["1", "-inf"] }])).toThrow(StatsInputError);
  });

  it("keeps zero values and mixed scales exact", () => {
    const s = prepareSample([{ name: "A", values: ["0", "1e3", "0.001", "-2.5"] }]);
    const v = Array.from(s.groups[0]!.centred).map((c) => c + s.offset);
    expect(v).toEqual([0, 1000, 0.001, -2.5]);
  });
});
