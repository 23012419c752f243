import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { TextField } from "@/components/ui/text-field";
import {
  createStudyInputSchema,
  toCreateStudyBody,
  useCreateStudy,
  type CreateStudyForm,
} from "../api/create-study";
import { CONTEXT_LABELS } from "@/lib/labels";
import type { StudyDto as Study, StudyContext } from "@waymark/contract";
import { LevelsEditor } from "./levels-editor";

const DEFAULTS: CreateStudyForm = {
  title: "",
  objective: "",
  outcomeName: "",
  outcomeUnit: "",
  factorName: "",
  levels: [{ name: "" }, { name: "" }, { name: "" }],
  hasControl: false,
  controlLevel: "",
  alpha: 0.05,
  context: "general",
};

const CONTEXT_HINTS: Record<StudyContext, string> = {
  general: "Research or quality work without direct consequences for patients or safety.",
  clinical: "Results may inform care of patients or clinical decisions.",
  "safety-critical": "Results may inform a decision where failure could harm people or property.",
};

/** Starts a study: what is measured, across which groups, at which α, in which setting. */
export function CreateStudyForm({ onCreated }: { onCreated: (study: Study) => void }) {
  const create = useCreateStudy();
  return (
    <Form
      schema={createStudyInputSchema}
      defaultValues={DEFAULTS}
      aria-label="New study"
      className="flex max-w-2xl flex-col gap-5"
      onSubmit={(values) => create.mutate(toCreateStudyBody(values), { onSuccess: onCreated })}
    >
      {(form) => {
        const { register, formState, watch } = form;
        const e = formState.errors;
        const hasControl = watch("hasControl");
        const levelNames = watch("levels")
          .map((l) => l.name.trim())
          .filter(Boolean);
        return (
          <>
            <TextField label="Title" error={e.title?.message} {...register("title")} />
            <div className="flex flex-col gap-1">
              <label htmlFor="objective" className="text-sm font-medium">
                Objective
              </label>
              <textarea
                id="objective"
                rows={3}
                aria-invalid={e.objective ? true : undefined}
                className={`rounded-md border bg-paper px-3 py-2 outline-none focus:border-spruce focus:ring-2 focus:ring-spruce/30 ${e.objective ? "border-brick" : "border-ink/25"}`}
                {...register("objective")}
              />
              <p className="text-xs text-ink-soft">
                The question the comparison should answer, in one or two sentences.
              </p>
              {e.objective && (
                <p role="alert" className="text-sm text-brick">
                  {e.objective.message}
                </p>
              )}
            </div>
            <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
              <TextField
                label="Outcome"
                hint="What is measured on each unit"
                error={e.outcomeName?.message}
                {...register("outcomeName")}
              />
              <TextField
                label="Unit"
                hint="e.g. MPa, mg/L; leave empty for scores"
                error={e.outcomeUnit?.message}
                {...register("outcomeUnit")}
              />
            </div>
            <TextField
              label="Grouping factor"
              hint="What makes the groups differ, e.g. curing method"
              error={e.factorName?.message}
              {...register("factorName")}
            />
            <LevelsEditor form={form} />
            <fieldset className="flex flex-col gap-2">
              <legend className="text-sm font-medium">Control group</legend>
              <label className="flex items-center gap-2 text-sm">
                <input type="checkbox" {...register("hasControl")} /> One of the levels is a control or
                reference group
              </label>
              {hasControl && (
                <div className="flex flex-col gap-1">
                  <label htmlFor="controlLevel" className="text-sm">
                    Which level is the control?
                  </label>
                  <select
                    id="controlLevel"
                    className="w-64 rounded-md border border-ink/25 bg-paper px-3 py-2"
                    {...register("controlLevel")}
                  >
                    <option value="">Choose a level…</option>
                    {levelNames.map((n) => (
                      <option key={n} value={n}>
                        {n}
                      </option>
                    ))}
                  </select>
                  {e.controlLevel && (
                    <p role="alert" className="text-sm text-brick">
                      {e.controlLevel.message}
                    </p>
                  )}
                </div>
              )}
            </fieldset>
            <div className="max-w-xs">
              <TextField
                label="Significance level α"
                type="number"
                step="0.001"
                hint="The chance of a false alarm you accept per test; .05 is common."
                error={e.alpha?.message}
                {...register("alpha", { valueAsNumber: true })}
              />
            </div>
            <fieldset className="flex flex-col gap-2">
              <legend className="text-sm font-medium">Setting</legend>
              {(Object.keys(CONTEXT_LABELS) as StudyContext[]).map((c) => (
                <label key={c} className="flex items-start gap-2 text-sm">
                  <input type="radio" value={c} className="mt-1" {...register("context")} />
                  <span>
                    <span className="font-medium">{CONTEXT_LABELS[c]}</span>{" "}
                    <span className="text-ink-soft">— {CONTEXT_HINTS[c]}</span>
                  </span>
                </label>
              ))}
            </fieldset>
            {create.error && <ErrorPanel title="The study was not created" message={create.error.message} />}
            <div>
              <Button type="submit" disabled={create.isPending}>
                {create.isPending ? "Creating…" : "Create the study"}
              </Button>
            </div>
          </>
        );
      }}
    </Form>
  );
}
