import { describe, expect, it } from "vitest";
import { parseDecimal } from "./parse-decimal.js";
import { shortDecimalOfNumber } from "./short-decimal-of-number.js";

describe("shortDecimalOfNumber", () => {
  it("finds the decimal of String(x) without building a string", () => {
    const out = { mantissa: 0, exponent: 0 };
    expect(shortDecimalOfNumber(1000000000000.4, out)).toBe(true);
    expect(out).toEqual({ mantissa: 10000000000004, exponent: -1 });
    expect(shortDecimalOfNumber(0.1, out)).toBe(true);
    expect(out).toEqual({ mantissa: 1, exponent: -1 });
  });

  it("agrees with the shortest round-trip text (ECMAScript Number::toString) on many doubles", () => {
    const out = { mantissa: 0, exponent: 0 };
    let checked = 0;
    for (let i = 1; i < 20000; i++) {
      // Values with 0–9 decimals and magnitudes from 1e-3 to 1e9.
      const x = Number(((i * 7919) % 1000003) / 10 ** (i % 10)) * 10 ** ((i % 7) - 3);
      if (!shortDecimalOfNumber(x, out)) continue;
      const p = parseDecimal(String(x));
      expect([out.mantissa * 10 ** 0, out.exponent]).toEqual(
        [p.mantissa, p.exponent].map((v, j) =>
          j === 0 ? v * 10 ** (p.exponent - out.exponent) : out.exponent,
        ),
      );
      checked++;
    }
    expect(checked).toBeGreaterThan(10000);
  });

  it("declines full-precision doubles", () => {
    const out = { mantissa: 0, exponent: 0 };
    expect(shortDecimalOfNumber(0.1 + 0.2, out)).toBe(false);
    expect(shortDecimalOfNumber(Math.PI, out)).toBe(false);
  });
});
