import type { Unavailable } from "@waymark/stats/result";

/**
 * Reading engine output on screen: a value may be Unavailable (with its reason), and nothing
 * that is not a finite number is ever shown.
 */
export type Maybe<T> = T | Unavailable;

export function isUnavailable(x: unknown): x is Unavailable {
  return !!x && typeof x === "object" && (x as { available?: unknown }).available === false;
}

export function isAvailable<T>(x: T | Unavailable | undefined | null): x is Exclude<T, Unavailable> {
  return x !== undefined && x !== null && !isUnavailable(x);
}

/** A finite number, or null for anything else (missing, Unavailable, NaN, text). */
export function num(x: unknown): number | null {
  return typeof x === "number" && Number.isFinite(x) ? x : null;
}

/** The reason a value is missing, as a sentence. */
export function reasonOf(x: unknown, fallback = "This value was not computed."): string {
  if (isUnavailable(x) && typeof x.reason === "string" && x.reason.trim()) return sentence(x.reason);
  return fallback;
}

function sentence(s: string): string {
  const t = s.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}
