import { useState } from "react";
import { z } from "zod";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { formatDateTime } from "@/lib/format";
import type { OrganizationSettings } from "../api/get-settings";
import { useUpdateSettings } from "../api/update-settings";
import { ALPHA_MESSAGE, alpha, PAPER_SIZES } from "@waymark/contract";
import { ADJUSTMENT_TERMS, ADJUSTMENTS, POLICIES, POLICY_TERMS } from "@waymark/stats/vocabulary";
import { ADJUSTMENT_HINTS } from "@/lib/labels";

const PAPER = [
  { value: "A4", title: "A4", line: "210 × 297 mm" },
  { value: "Letter", title: "Letter", line: "8.5 × 11 in" },
] as const;

const schema = z.object({
  policy: z.enum(POLICIES, "Choose a test policy"),
  defaultAlpha: z
    .string()
    .trim()
    .min(1, "Enter the default significance level, such as 0.05")
    .refine((s) => /^(0?\.\d+|0|1)$/.test(s), "Write α as a decimal between 0 and 1, such as 0.05")
    .refine((s) => alpha.safeParse(Number(s)).success, ALPHA_MESSAGE),
  defaultAdjust: z.enum(ADJUSTMENTS, "Choose an adjustment"),
  paperSize: z.enum(PAPER_SIZES, "Choose a paper size"),
});
type Values = z.infer<typeof schema>;

function Choice({
  name,
  value,
  title,
  line,
  register,
}: {
  name: string;
  value: string;
  title: string;
  line: string;
  register: object;
}) {
  return (
    <label className="flex cursor-pointer gap-3 rounded-md border border-ink/15 bg-paper p-3 has-[:checked]:border-spruce has-[:checked]:bg-spruce-100/50">
      <input type="radio" value={value} name={name} className="mt-1 h-4 w-4 accent-spruce" {...register} />
      <span>
        <span className="block font-semibold">{title}</span>
        <span className="block text-sm text-ink-soft">{line}</span>
      </span>
    </label>
  );
}

/** The organization's test policy and the defaults every new study starts from. */
export function SettingsForm({ settings }: { settings: OrganizationSettings }) {
  const save = useUpdateSettings();
  const [saved, setSaved] = useState(false);
  const [refusal, setRefusal] = useState<string | null>(null);
  return (
    <Form<Values>
      schema={schema}
      defaultValues={{
        policy: settings.policy,
        defaultAlpha: String(settings.defaultAlpha),
        defaultAdjust: settings.defaultAdjust,
        paperSize: settings.paperSize,
      }}
      aria-label="Organization settings"
      className="flex max-w-3xl flex-col gap-6"
      onSubmit={async (v) => {
        setSaved(false);
        setRefusal(null);
        try {
          await save.mutateAsync({
            policy: v.policy,
            defaultAlpha: Number(v.defaultAlpha),
            defaultAdjust: v.defaultAdjust,
            paperSize: v.paperSize,
          });
          setSaved(true);
        } catch (e) {
          setRefusal(e instanceof Error ? e.message : "The settings were not saved.");
        }
      }}
    >
      {(form) => (
        <>
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 font-semibold">Test policy</legend>
            <p className="text-sm text-ink-soft">
              For a question about averages: classic-first keeps classic one-way ANOVA when a plan puts the
              same number of units in every group, with one named rule that moves it to Welch's ANOVA;
              welch-first uses Welch's ANOVA. The test is fixed when the plan is locked.
            </p>
            {POLICIES.map((p) => (
              <Choice
                key={p}
                name="policy"
                value={p}
                title={POLICY_TERMS[p].title}
                line={POLICY_TERMS[p].sentence}
                register={form.register("policy")}
              />
            ))}
          </fieldset>

          <div className="flex max-w-xs flex-col gap-1">
            <label htmlFor="default-alpha" className="font-semibold">
              Default significance level (α)
            </label>
            <input
              id="default-alpha"
              inputMode="decimal"
              aria-invalid={form.formState.errors.defaultAlpha ? true : undefined}
              aria-describedby={
                form.formState.errors.defaultAlpha ? "default-alpha-error" : "default-alpha-hint"
              }
              className={`num rounded-md border bg-paper px-3 py-2 outline-none focus:border-spruce focus:ring-2 focus:ring-spruce/30 ${form.formState.errors.defaultAlpha ? "border-brick" : "border-ink/25"}`}
              {...form.register("defaultAlpha")}
            />
            {form.formState.errors.defaultAlpha ? (
              <p id="default-alpha-error" role="alert" className="text-sm text-brick">
                {form.formState.errors.defaultAlpha.message}
              </p>
            ) : (
              <p id="default-alpha-hint" className="text-xs text-ink-soft">
                Usually 0.05. An analyst can set another level in a study's plan before it is locked.
              </p>
            )}
          </div>

          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 font-semibold">Default adjustment for multiple comparisons</legend>
            {ADJUSTMENTS.map((a) => (
              <Choice
                key={a}
                name="defaultAdjust"
                value={a}
                title={ADJUSTMENT_TERMS[a].title}
                line={ADJUSTMENT_HINTS[a]}
                register={form.register("defaultAdjust")}
              />
            ))}
          </fieldset>

          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 font-semibold">Paper size of reports</legend>
            <div className="grid gap-2 sm:grid-cols-2">
              {PAPER.map((p) => (
                <Choice
                  key={p.value}
                  name="paperSize"
                  value={p.value}
                  title={p.title}
                  line={p.line}
                  register={form.register("paperSize")}
                />
              ))}
            </div>
          </fieldset>

          <div className="flex flex-col gap-2">
            <p className="text-sm text-ink-soft">
              New studies start from these settings; studies already created keep their own plan.
            </p>
            {refusal && <ErrorPanel title="The settings were not saved" message={refusal} />}
            {saved && (
              <p role="status" className="rounded-md bg-spruce-100 p-2 text-sm text-spruce">
                Saved{save.data?.updatedAt ? ` at ${formatDateTime(save.data.updatedAt)}` : ""}.
              </p>
            )}
            <div>
              <Button type="submit" disabled={form.formState.isSubmitting}>
                {form.formState.isSubmitting ? "Saving…" : "Save settings"}
              </Button>
            </div>
          </div>
        </>
      )}
    </Form>
  );
}
