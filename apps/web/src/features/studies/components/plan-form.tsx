import { z } from "zod";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { TextField } from "@/components/ui/text-field";
import { useSavePlan } from "../api/save-plan";
import { ADJUSTMENT_TERMS, ADJUSTMENTS, POLICIES, POLICY_TERMS } from "@waymark/stats/vocabulary";
import { ADJUSTMENT_HINTS } from "@/lib/labels";
import { alpha, type StudyDto as Study } from "@waymark/contract";

export const planFormSchema = z.object({
  policy: z.enum(POLICIES, { error: "Choose a test policy" }),
  adjust: z.enum(ADJUSTMENTS, { error: "Choose a p-value adjustment" }),
  alpha,
});
export type PlanFormValues = z.infer<typeof planFormSchema>;

/** The rules of the analysis: test policy, p-value adjustment and α. Saved to the plan. */
export function PlanForm({ study }: { study: Study }) {
  const save = useSavePlan(study.id);
  return (
    <Form
      schema={planFormSchema}
      defaultValues={{ policy: study.plan.policy, adjust: study.plan.adjust, alpha: study.plan.alpha }}
      aria-label="Analysis plan"
      className="flex flex-col gap-5"
      onSubmit={(v) => save.mutate(v)}
    >
      {({ register, formState }) => (
        <>
          <fieldset className="flex flex-col gap-2">
            <legend className="text-sm font-semibold">Test policy</legend>
            {POLICIES.map((p) => (
              <label key={p} className="flex items-start gap-2 text-sm">
                <input type="radio" value={p} className="mt-1 accent-spruce" {...register("policy")} />
                <span>
                  <span className="font-medium">{POLICY_TERMS[p].title}.</span>{" "}
                  <span className="text-ink-soft">{POLICY_TERMS[p].sentence}</span>
                </span>
              </label>
            ))}
            <p className="text-xs text-ink-soft">
              Either way, a rank-based test (Kruskal–Wallis) is used when the outcome is a rating or the
              checks find extreme values.
            </p>
            {formState.errors.policy && (
              <p role="alert" className="text-sm text-brick">
                {formState.errors.policy.message}
              </p>
            )}
          </fieldset>
          <fieldset className="flex flex-col gap-2">
            <legend className="text-sm font-semibold">p-value adjustment</legend>
            {ADJUSTMENTS.map((a) => (
              <label key={a} className="flex items-start gap-2 text-sm">
                <input type="radio" value={a} className="mt-1 accent-spruce" {...register("adjust")} />
                <span>
                  <span className="font-medium">{ADJUSTMENT_TERMS[a].title}.</span>{" "}
                  <span className="text-ink-soft">{ADJUSTMENT_HINTS[a]}</span>
                </span>
              </label>
            ))}
            <p className="text-xs text-ink-soft">
              Applies to comparisons built from separate p-values (Dunn's test, Welch t-tests against a
              control). Tukey–Kramer, Games–Howell and Dunnett hold the family-wise error through their own
              reference distributions.
            </p>
            {formState.errors.adjust && (
              <p role="alert" className="text-sm text-brick">
                {formState.errors.adjust.message}
              </p>
            )}
          </fieldset>
          <div className="max-w-xs">
            <TextField
              label="Significance level α"
              type="number"
              step="0.001"
              error={formState.errors.alpha?.message}
              hint="The false-alarm rate accepted for the omnibus test and for the family of comparisons."
              {...register("alpha", { valueAsNumber: true })}
            />
          </div>
          {save.error && <ErrorPanel title="The plan was not saved" message={save.error.message} />}
          <div className="flex items-center gap-3">
            <Button type="submit" disabled={save.isPending}>
              {save.isPending ? "Saving…" : "Save the plan"}
            </Button>
            {save.isSuccess && !formState.isDirty && (
              <span className="text-sm text-spruce" role="status">
                Plan saved.
              </span>
            )}
          </div>
        </>
      )}
    </Form>
  );
}
