import type { StudyProgress } from "@waymark/contract";

type State = StudyProgress["state"];

const TONES: Partial<Record<State, string>> = {
  "changes-requested": "bg-brick-100 text-brick ring-brick/40",
  "in-review": "bg-amber-100 text-amber-800 ring-amber/50",
  approved: "bg-spruce-100 text-spruce ring-spruce/40",
  "out-of-scope": "bg-amber-100 text-amber-800 ring-amber/50",
};

/** The study's one status in a few words, as the server computed it. Text, not colour alone. */
export function ProgressBadge({ progress }: { progress: StudyProgress }) {
  return (
    <span
      data-testid="progress-badge"
      data-state={progress.state}
      className={`inline-flex items-center gap-1 rounded-full px-2.5 py-0.5 text-xs font-semibold ring-1 ${TONES[progress.state] ?? "bg-panel text-ink ring-ink/20"}`}
    >
      {progress.label}
    </span>
  );
}
