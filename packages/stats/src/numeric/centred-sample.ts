/**
 * The engine's working form of the data: every group's values minus one common offset,
 * with the offset removed exactly on the decimal text before conversion to doubles.
 * Every method accepts this form (made once by `prepareSample`) so a full analysis parses once.
 */
export interface CentredGroup {
  readonly name: string;
  /** Values minus the sample's common offset, in input order, missing values dropped. */
  readonly centred: Float64Array;
  /** Original row number of each kept value (as given by the caller), if rows were given. */
  readonly rows: readonly number[] | undefined;
  /** Count of missing cells (null, empty, "NA", ...) that were dropped. */
  readonly missing: number;
  /**
   * When set, every centred value was computed as (integer)/integerDivisor, so the integers
   * can be recovered exactly (round(value·divisor)) and sorted by counting.
   */
  readonly integerDivisor?: number;
}

/**
 * How the offset was removed:
 * - "scaled-integer": every value is m·10^e with small integer m; M − C is exact in doubles.
 * - "big-integer": the same, with BigInt for mantissas beyond 2^53.
 * - "binary": values are full-precision doubles (no short decimal text) or span too many
 *   orders of magnitude; the offset is subtracted in correctly rounded binary arithmetic.
 */
export type CentringMethod = "scaled-integer" | "big-integer" | "binary";

export interface CentredSample {
  readonly kind: "centred-sample";
  readonly groups: readonly CentredGroup[];
  /** The common offset as a double (value = offset + centred, up to one rounding). */
  readonly offset: number;
  readonly centring: CentringMethod;
  /**
   * For "scaled-integer": the decimal exponent E and integer offset C with
   * centred = (M − C)·10^E, so an original value can be rebuilt exactly.
   */
  readonly scaleExponent: number;
  readonly offsetInteger: number;
}

/** What methods accept: raw groups (numbers or decimal text) or an already-prepared sample. */
export interface GroupInput {
  readonly name: string;
  /** Numbers or decimal text; a Float64Array (NaN = missing) when every value is a number. */
  readonly values: readonly (number | string | null | undefined)[] | Float64Array;
  /** Optional original row numbers (e.g. CSV line numbers), used in messages and outlier lists. */
  readonly rows?: readonly number[];
}

export type SampleInput = readonly GroupInput[] | CentredSample;
