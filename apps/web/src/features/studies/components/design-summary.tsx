import { Button } from "@/components/ui/button";
import { DESIGN_QUESTIONS } from "../design-questions";
import type { StudyDto as Study } from "@waymark/contract";

/** All design answers on one screen, each with a way back to its question while it can change. */
export function DesignSummary({ study, onEdit }: { study: Study; onEdit?: (index: number) => void }) {
  return (
    <dl className="divide-y divide-ink/10 rounded-lg bg-paper shadow-sm" aria-label="Design answers">
      {DESIGN_QUESTIONS.map((q, i) => {
        const a = study.design[q.key];
        return (
          <div key={q.key} className="flex flex-wrap items-center gap-3 p-3">
            <dt className="min-w-0 flex-1 text-sm">{q.question}</dt>
            <dd className="flex items-center gap-3 text-sm font-semibold">
              <span className={a === "unsure" ? "text-amber-800" : undefined}>
                {a ? (q.short[a] ?? a) : "Not answered"}
                {q.key === "hasControl" && a === "yes" && study.controlLevel ? `: ${study.controlLevel}` : ""}
              </span>
              {onEdit && (
                <Button
                  variant="quiet"
                  className="!px-2 !py-1 font-normal text-lake"
                  onClick={() => onEdit(i)}
                  aria-label={`Change the answer to: ${q.question}`}
                >
                  Change
                </Button>
              )}
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
