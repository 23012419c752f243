import { useState } from "react";
import { Link } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { studyPath } from "@/config/paths";
import { useSaveDesign } from "../api/save-design";
import { useUpdateStudy } from "../api/update-study";
import { DESIGN_QUESTIONS, firstUnanswered } from "../design-questions";
import type { DesignAnswers, StudyDto as Study } from "@waymark/contract";
import { ControlPicker } from "./control-picker";
import { DesignQuestionCard } from "./design-question-card";
import { DesignSummary } from "./design-summary";
import { NotSurePanel } from "./not-sure-panel";
import { OutOfScopeStop } from "./out-of-scope-stop";

/**
 * The design questions, one per screen. Each answer is saved as soon as it is given; answers can
 * be revised until the plan is locked. A "matched units" answer stops the path.
 */
export function DesignQuestionnaire({ study, readOnly = false }: { study: Study; readOnly?: boolean }) {
  const save = useSaveDesign(study.id);
  const update = useUpdateStudy(study.id);
  const total = DESIGN_QUESTIONS.length;
  const [index, setIndex] = useState(() => (readOnly ? total : firstUnanswered(study.design)));
  const [picked, setPicked] = useState<{ key: string; value: string } | null>(null);
  const locked = !!study.plan.lockedAt;
  const editable = !readOnly && !locked;

  if (!editable || index >= total) {
    return (
      <div className="flex flex-col gap-4">
        {study.outOfScope ? (
          <OutOfScopeStop reason={study.outOfScope} onRevise={editable ? () => setIndex(0) : undefined} />
        ) : null}
        <DesignSummary study={study} onEdit={editable ? setIndex : undefined} />
        {locked && (
          <p className="text-sm text-ink-soft">The answers are fixed: the plan built on them is locked.</p>
        )}
        {editable && !study.outOfScope && study.designComplete && (
          <p>
            <Link
              to={studyPath(study.id, "plan")}
              className="inline-flex rounded-md bg-spruce px-4 py-2 text-sm font-semibold text-stone no-underline hover:bg-spruce-700 hover:no-underline"
            >
              Go on to the plan
            </Link>
          </p>
        )}
        {editable && !study.designComplete && !study.outOfScope && (
          <p className="text-sm text-amber-800">
            {study.designBlocker ?? "Some questions still need an answer before the plan can be made."}
          </p>
        )}
      </div>
    );
  }

  const q = DESIGN_QUESTIONS[index]!;
  // The choice shows at once; if saving fails it falls back to the stored answer.
  const value =
    (picked?.key === q.key ? picked.value : undefined) ?? (study.design[q.key] as string | undefined);
  const stop = q.key === "independence" && (value === "paired" || !!study.outOfScope);
  const controlReady = study.design.hasControl === "yes" && !!study.controlLevel;
  const disabledValues: Record<string, string> =
    q.key === "comparisons" && !controlReady
      ? { "vs-control": "Needs a control group: answer “yes” to the previous question and name the control." }
      : {};

  const answer = (v: string) => {
    const body: DesignAnswers = { [q.key]: v };
    if (q.key === "hasControl" && v !== "yes" && study.design.comparisons === "vs-control")
      body.comparisons = "all-pairs";
    setPicked({ key: q.key, value: v });
    save.mutate(body, { onError: () => setPicked(null) });
  };
  const canGoOn =
    !save.isPending &&
    !save.isError &&
    value !== undefined &&
    !stop &&
    !(q.key === "hasControl" && value === "yes" && !study.controlLevel);

  return (
    <div className="max-w-2xl">
      <p className="text-sm font-medium text-ink-soft" aria-live="polite">
        Question {index + 1} of {total}
        {save.isPending ? " · saving…" : save.isSuccess ? " · answer saved" : ""}
      </p>
      <div className="mt-2 rounded-lg bg-paper p-5 shadow-sm ring-1 ring-ink/5">
        <DesignQuestionCard
          key={q.key}
          question={q}
          value={value}
          onAnswer={answer}
          disabledValues={disabledValues}
        />
        {q.key === "hasControl" && value === "yes" && (
          <ControlPicker
            levels={study.levels}
            value={study.controlLevel}
            disabled={update.isPending}
            onChange={(level) => update.mutate({ controlLevel: level })}
          />
        )}
        {value === "unsure" && <NotSurePanel question={q} />}
      </div>
      {save.error && (
        <div className="mt-3">
          <ErrorPanel title="The answer was not saved" message={save.error.message} />
        </div>
      )}
      {update.error && (
        <div className="mt-3">
          <ErrorPanel title="The control was not saved" message={update.error.message} />
        </div>
      )}
      {stop && (
        <div className="mt-4">
          <OutOfScopeStop reason={study.outOfScope} />
        </div>
      )}
      <div className="mt-4 flex gap-2">
        <Button variant="secondary" disabled={index === 0} onClick={() => setIndex(index - 1)}>
          Back
        </Button>
        <Button disabled={!canGoOn} onClick={() => setIndex(index + 1)}>
          {index === total - 1 ? "See all answers" : "Next question"}
        </Button>
      </div>
    </div>
  );
}
