import { useState } from "react";
import { z } from "zod";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { SelectField } from "@/components/ui/select-field";
import { TextArea } from "@/components/ui/text-area";
import { useRequestChanges, type RequestChangesInput } from "../api/request-changes";
import { STEP_LABELS } from "../labels";
import { LIMITS, REVIEW_STEPS, type ReviewStep } from "@waymark/contract";

const schema = z.object({
  comment: z
    .string()
    .trim()
    .min(1, "Say what needs to change")
    .max(LIMITS.comment, `Keep the comment to ${LIMITS.comment.toLocaleString("en")} characters or fewer`),
  step: z.enum(["", ...REVIEW_STEPS] as [string, ...string[]]),
  design: z.string().max(LIMITS.comment),
  plan: z.string().max(LIMITS.comment),
  data: z.string().max(LIMITS.comment),
  checks: z.string().max(LIMITS.comment),
  choice: z.string().max(LIMITS.comment),
  results: z.string().max(LIMITS.comment),
});
type Values = z.infer<typeof schema>;

const STEP_OPTIONS = [
  { value: "", label: "The study as a whole" },
  ...REVIEW_STEPS.map((s) => ({ value: s, label: STEP_LABELS[s] })),
];

export function toRequestBody(v: Values): RequestChangesInput {
  const stepComments = REVIEW_STEPS.map((step) => ({ step, body: v[step].trim() })).filter(
    (c) => c.body.length > 0,
  );
  return {
    comment: v.comment.trim(),
    step: v.step ? (v.step as ReviewStep) : null,
    ...(stepComments.length ? { stepComments } : {}),
  };
}

/** Sends the study back to its analyst with a required comment and, if useful, a note per step. */
export function RequestChangesForm({ studyId, onSent }: { studyId: number; onSent?: () => void }) {
  const send = useRequestChanges(studyId);
  const [refusal, setRefusal] = useState<string | null>(null);
  return (
    <Form<Values>
      schema={schema}
      defaultValues={{
        comment: "",
        step: "",
        design: "",
        plan: "",
        data: "",
        checks: "",
        choice: "",
        results: "",
      }}
      aria-label="Request changes"
      className="flex flex-col gap-4"
      onSubmit={async (values) => {
        setRefusal(null);
        try {
          await send.mutateAsync(toRequestBody(values));
          onSent?.();
        } catch (e) {
          setRefusal(e instanceof Error ? e.message : "The request was not recorded.");
        }
      }}
    >
      {(form) => (
        <>
          <p className="text-sm">
            The study goes back to its analyst as a draft. Your comments stay in the study's history.
          </p>
          <TextArea
            label="What needs to change"
            rows={4}
            error={form.formState.errors.comment?.message}
            {...form.register("comment")}
          />
          <SelectField label="Mainly about" options={STEP_OPTIONS} {...form.register("step")} />
          <details className="rounded-md border border-ink/15 p-3">
            <summary className="cursor-pointer text-sm font-medium">
              Add a comment on a particular step (optional)
            </summary>
            <div className="mt-3 flex flex-col gap-3">
              {REVIEW_STEPS.map((s) => (
                <TextArea
                  key={s}
                  label={`${STEP_LABELS[s]} step`}
                  rows={2}
                  error={form.formState.errors[s]?.message}
                  {...form.register(s)}
                />
              ))}
            </div>
          </details>
          {refusal && <ErrorPanel title="The request was not recorded" message={refusal} />}
          <Button type="submit" variant="secondary" disabled={form.formState.isSubmitting}>
            {form.formState.isSubmitting ? "Sending…" : "Send back to the analyst"}
          </Button>
        </>
      )}
    </Form>
  );
}
