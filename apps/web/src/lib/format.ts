import * as shared from "@waymark/stats/format";

/**
 * Number formatting for everything a person reads. The rules (p without a leading zero, "< .001",
 * true minus signs, Welch's df to one decimal) come from the engine's shared formatter, which the
 * API's report uses too; here a value that is not a finite number shows as "—" in tables.
 */

const MINUS = "\u2212";

function withMinus(text: string): string {
  return text.startsWith("-") ? MINUS + text.slice(1) : text;
}

/** "= .025", "< .001", "> .999"; "—" when p is not a finite probability. */
export function formatP(p: number): string {
  return Number.isFinite(p) && p >= 0 && p <= 1 ? shared.formatP(p) : "—";
}

/** A statistic to `digits` decimals with a true minus sign; "—" when not finite. */
export function formatStat(x: number, digits = 2): string {
  return Number.isFinite(x) ? shared.formatStat(x, digits) : "—";
}

/** Degrees of freedom: whole numbers as they are, fractional ones (Welch) to one decimal. */
export function formatDf(df: number): string {
  return Number.isFinite(df) ? shared.formatDf(df) : "—";
}

// ---- Web app's own helpers -------------------------------------------------------------------

/** A value bounded by ±1 (η², ω², ε², r, power) without the leading zero: ".17", "−.02". */
export function formatBounded(x: number, digits = 2): string {
  return Number.isFinite(x) ? shared.formatUnit(x, digits) : "—";
}

/** A plain number for tables (descriptives, data values): up to `digits` decimals, true minus. */
export function formatNumber(x: number, digits = 2): string {
  return formatStat(x, digits);
}

/** A data value as recorded (shortest round-trip form), with a true minus: 43.1 → "43.1". */
export function formatValue(x: number): string {
  if (!Number.isFinite(x)) return "—";
  return withMinus(String(Number(x.toPrecision(12))));
}

/** α for sentences: 0.05 → ".05", 0.001 → ".001". */
export function formatAlpha(alpha: number): string {
  if (!Number.isFinite(alpha)) return "—";
  const s = String(Number(alpha.toPrecision(3)));
  return s.replace(/^0\./, ".");
}

/** A share as a percentage: 0.1426 → "14.3 %". */
export function formatPercent(x: number, digits = 1): string {
  if (!Number.isFinite(x)) return "—";
  return `${(x * 100).toFixed(digits)}%`;
}

/** Bytes in the unit a person expects: "812 B", "14.2 kB", "3.1 MB". */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return "—";
  if (bytes < 1000) return `${bytes} B`;
  if (bytes < 1_000_000) return `${(bytes / 1000).toFixed(1)} kB`;
  return `${(bytes / 1_000_000).toFixed(1)} MB`;
}

/** "3 Dec 2025" */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return "—";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return "—";
  return d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
}

/** "3 Dec 2025, 14:05" */
export function formatDateTime(iso: string | null | undefined): string {
  if (!iso) return "—";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return "—";
  return `${formatDate(iso)}, ${d.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit" })}`;
}
