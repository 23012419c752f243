/**
 * A reading of a check as data: a stable code and its parameters (for the web app's and the
 * report's own wording and for tests) plus the plain English sentence.
 * Example: { code: "normality.group-departs", params: { group: "B", p: 0.003 }, text: "…" }.
 */
export interface CheckReading {
  code: string;
  params: Record<string, string | number | readonly string[]>;
  text: string;
}
