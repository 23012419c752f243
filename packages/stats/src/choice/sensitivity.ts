import { formatP, formatUnit } from "../reporting/format.js";
import type { CodedText } from "../vocabulary/coded-text.js";
import { SENSITIVITY_TESTS, type OmnibusTest, type SensitivityTest } from "../vocabulary/ids.js";
import { SENSITIVITY_TERMS } from "../vocabulary/names.js";
import { note } from "./note.js";

/** What each alternative asks differently from the primary test, for the disagreement sentence. */
const WHAT_IT_ASKS: Record<SensitivityTest, string> = {
  anova: "it assumes equal spreads in every group",
  welch: "it compares means without assuming equal spreads",
  "kruskal-wallis": "it asks whether some group tends to have larger values, not whether the means differ",
  "trimmed-means": "it compares 20% trimmed means, which give the tails less weight",
};

export type SensitivityEntry =
  | { test: SensitivityTest; available: true; p: number; significant: boolean; agrees: boolean }
  | { test: SensitivityTest; available: false; reason: string };

export interface SensitivityAnalyses {
  primary: OmnibusTest;
  alpha: number;
  entries: SensitivityEntry[];
  notes: CodedText[];
}

type PartP = { available: true; p: number } | { available: false; reason: string };

/**
 * The other omnibus tests run beside the primary one, with a sentence when one of them reaches
 * a different conclusion at α. They inform the reader; they never replace the primary test.
 * Example: primary Welch p = .012, Kruskal–Wallis p = .081 at α = .05 → one disagreement note.
 * Cost: O(number of tests). Pure.
 */
export function sensitivityAnalyses(
  primary: OmnibusTest,
  alpha: number,
  parts: Partial<Record<SensitivityTest, PartP>>,
): SensitivityAnalyses {
  const primaryPart = parts[primary];
  const primarySignificant = primaryPart?.available ? primaryPart.p < alpha : null;
  const entries: SensitivityEntry[] = [];
  const notes: CodedText[] = [];
  for (const test of SENSITIVITY_TESTS) {
    if (test === primary) continue;
    const part = parts[test];
    if (!part) continue;
    if (!part.available) {
      entries.push({ test, available: false, reason: part.reason });
      continue;
    }
    const significant = part.p < alpha;
    const agrees = primarySignificant === null ? true : significant === primarySignificant;
    entries.push({ test, available: true, p: part.p, significant, agrees });
    if (!agrees && primaryPart?.available) {
      const label = SENSITIVITY_TERMS[test].name;
      notes.push(
        note(
          "sensitivity.disagrees",
          { test, p: part.p, primary, primaryP: primaryPart.p, alpha },
          `${label[0]!.toUpperCase()}${label.slice(1)} ${significant ? "finds" : "does not find"} a difference at α = ${formatUnit(alpha)} (p ${formatP(part.p)}), unlike the primary ${SENSITIVITY_TERMS[primary].name} (p ${formatP(primaryPart.p)}); ${WHAT_IT_ASKS[test]}. The conclusion is sensitive to that choice, so report it with care.`,
        ),
      );
    }
  }
  if (primarySignificant !== null && notes.length === 0 && entries.some((e) => e.available)) {
    notes.push(
      note(
        "sensitivity.all-agree",
        { alpha },
        `Every sensitivity analysis reaches the same conclusion at α = ${formatUnit(alpha)} as the primary test.`,
      ),
    );
  }
  return { primary, alpha, entries, notes };
}
