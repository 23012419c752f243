import { STATUS_LABELS } from "@/lib/labels";
import type { StudyStatus } from "@waymark/contract";

const STYLES: Record<StudyStatus, string> = {
  draft: "bg-panel text-ink ring-ink/20",
  in_review: "bg-amber-100 text-amber-800 ring-amber/50",
  approved: "bg-spruce-100 text-spruce ring-spruce/40",
};

/** Where the study is in its life: draft, in review or approved. Text, not colour alone. */
export function LifecycleBadge({ status }: { status: StudyStatus }) {
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-full px-2.5 py-0.5 text-xs font-semibold ring-1 ${STYLES[status] ?? STYLES.draft}`}
    >
      {STATUS_LABELS[status] ?? status}
    </span>
  );
}
