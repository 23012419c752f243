import type { StudyContext } from "@waymark/contract";

export const CAUTION_TEXT =
  "This analysis supports, and does not replace, the judgement of a qualified statistician and the codes, regulations and licensed practice that apply.";

/** The caution shown with results from clinical or safety-critical studies. */
export function CautionNote({ context }: { context: StudyContext }) {
  if (context !== "clinical" && context !== "safety-critical") return null;
  return (
    <aside
      aria-label="Caution"
      className="rounded-md border-l-4 border-brick bg-paper p-4 text-sm"
      data-testid="caution-note"
    >
      {CAUTION_TEXT}
    </aside>
  );
}
