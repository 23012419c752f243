import { describe, expect, it } from "vitest";
import { parseDecimal } from "./parse-decimal.js";
import { parseDecimalBig } from "./parse-decimal-big.js";

describe("parseDecimal", () => {
  it("reads decimal text as an exact integer mantissa and a power of ten", () => {
    expect(parseDecimal("107.8681568")).toMatchObject({
      kind: "number",
      mantissa: 1078681568,
      exponent: -7,
      long: false,
    });
    expect(parseDecimal("1000000000000.4")).toMatchObject({ mantissa: 10000000000004, exponent: -1 });
    expect(parseDecimal(" -0.050 ")).toMatchObject({ mantissa: -5, exponent: -2 });
    expect(parseDecimal("+4")).toMatchObject({ mantissa: 4, exponent: 0 });
    expect(parseDecimal("1.25e3")).toMatchObject({ mantissa: 125, exponent: 1 });
    expect(parseDecimal("2E-4")).toMatchObject({ mantissa: 2, exponent: -4 });
    expect(parseDecimal(".5")).toMatchObject({ mantissa: 5, exponent: -1 });
    expect(parseDecimal("0")).toMatchObject({ kind: "number", mantissa: 0 });
  });

  it("folds trailing zeros so 4.10 and 4.1 share a scale", () => {
    expect(parseDecimal("4.10")).toMatchObject({ mantissa: 41, exponent: -1 });
    expect(parseDecimal("1200")).toMatchObject({ mantissa: 12, exponent: 2 });
  });

  it("flags mantissas beyond 15 digits for the BigInt reader", () => {
    expect(parseDecimal("0.30000000000000004").long).toBe(true);
    expect(parseDecimalBig("0.30000000000000004")).toEqual({ mantissa: 30000000000000004n, exponent: -17 });
    expect(parseDecimalBig("-12.5e3")).toEqual({ mantissa: -125n, exponent: 2 });
  });

  it("recognises missing, infinite and non-numeric text", () => {
    for (const t of ["", "  ", "NA", "N/A", "NaN", "na"]) expect(parseDecimal(t).kind).toBe("missing");
    for (const t of ["inf", "-Infinity", "Infinity", "+inf", "1e999"])
      expect(parseDecimal(t).kind).toBe("infinite");
    for (const t of ["abc", "3,5", "1.2.3", "-", "e5", "1e", "12kg", "0x10"])
      expect(parseDecimal(t).kind).toBe("not-numeric");
  });
});
