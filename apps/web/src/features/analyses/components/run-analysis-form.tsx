import { z } from "zod";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { useCreateAnalysis } from "../api/create-analysis";
import { testTitle } from "@/lib/labels";
import { LIMITS, type AnalysisDto as Analysis } from "@waymark/contract";
import { OMNIBUS_TESTS, type OmnibusTest as TestId } from "@waymark/stats/vocabulary";

const MIN_JUSTIFICATION = LIMITS.minJustification;

export const runAnalysisSchema = (primary: string) =>
  z
    .object({ choice: z.enum(["recommended", "other"]), test: z.string(), justification: z.string() })
    .superRefine((v, ctx) => {
      if (v.choice !== "other") return;
      if (!v.test || v.test === primary)
        ctx.addIssue({ code: "custom", path: ["test"], message: "Choose the test you want to use instead" });
      const len = v.justification.trim().length;
      if (len < MIN_JUSTIFICATION)
        ctx.addIssue({
          code: "custom",
          path: ["justification"],
          message: `Write at least ${MIN_JUSTIFICATION} characters on why you depart from the plan (${len} so far)`,
        });
    });
type Values = { choice: "recommended" | "other"; test: string; justification: string };

/**
 * Runs the plan's primary test, or another one as a deviation from the plan with a written
 * justification the reviewer sees. A primary test that cannot be computed is not offered.
 */
export function RunAnalysisForm({
  studyId,
  datasetId,
  datasetVersion,
  primary,
  computable = true,
  onDone,
}: {
  studyId: number;
  datasetId: number;
  datasetVersion: number;
  primary: TestId;
  computable?: boolean;
  onDone: (a: Analysis) => void;
}) {
  const run = useCreateAnalysis(studyId);
  const others = OMNIBUS_TESTS.filter((t) => t !== primary);
  return (
    <Form
      schema={runAnalysisSchema(primary) as unknown as z.ZodType<Values, Values>}
      defaultValues={{ choice: computable ? "recommended" : "other", test: "", justification: "" }}
      aria-label="Run the analysis"
      className="flex flex-col gap-4 rounded-lg bg-paper p-5 shadow-sm"
      onSubmit={(v) =>
        run.mutate(
          v.choice === "other"
            ? { datasetId, test: v.test as TestId, justification: v.justification.trim() }
            : { datasetId },
          { onSuccess: onDone },
        )
      }
    >
      {({ register, watch, formState }) => {
        const other = watch("choice") === "other";
        const e = formState.errors;
        return (
          <>
            <fieldset className="flex flex-col gap-2 text-sm">
              <legend className="font-semibold">Which test runs on data version {datasetVersion}?</legend>
              <label className="flex items-center gap-2">
                <input type="radio" value="recommended" disabled={!computable} {...register("choice")} /> The
                plan's primary test: {testTitle(primary)}
                {!computable && " (cannot be computed on these data)"}
              </label>
              <label className="flex items-center gap-2">
                <input type="radio" value="other" {...register("choice")} /> A deviation from the plan:
                another test, with a written justification
              </label>
            </fieldset>
            {other && (
              <div className="flex flex-col gap-3 rounded-md border-l-4 border-amber bg-amber-100 p-4">
                <p className="text-sm font-semibold text-amber-800">A deviation from the plan</p>
                <p className="text-sm">
                  The justification is stored with the analysis; the reviewer sees it as a deviation from the
                  locked plan, and the report states it.
                </p>
                <div className="flex flex-col gap-1 text-sm">
                  <label htmlFor="override-test" className="font-medium">
                    Test to use
                  </label>
                  <select
                    id="override-test"
                    className="w-72 rounded-md border border-ink/25 bg-paper px-3 py-2"
                    aria-invalid={e.test ? true : undefined}
                    {...register("test")}
                  >
                    <option value="">Choose a test…</option>
                    {others.map((t) => (
                      <option key={t} value={t}>
                        {testTitle(t)}
                      </option>
                    ))}
                  </select>
                  {e.test && (
                    <p role="alert" className="text-brick">
                      {e.test.message}
                    </p>
                  )}
                </div>
                <div className="flex flex-col gap-1 text-sm">
                  <label htmlFor="override-why" className="font-medium">
                    Why this test instead
                  </label>
                  <textarea
                    id="override-why"
                    rows={3}
                    className="rounded-md border border-ink/25 bg-paper px-3 py-2"
                    aria-invalid={e.justification ? true : undefined}
                    {...register("justification")}
                  />
                  {e.justification ? (
                    <p role="alert" className="text-brick">
                      {e.justification.message}
                    </p>
                  ) : (
                    <p className="text-xs text-ink-soft">At least {MIN_JUSTIFICATION} characters.</p>
                  )}
                </div>
              </div>
            )}
            {run.error && <ErrorPanel title="The analysis did not run" message={run.error.message} />}
            <div>
              <Button type="submit" disabled={run.isPending}>
                {run.isPending ? "Running…" : "Run the analysis"}
              </Button>
            </div>
          </>
        );
      }}
    </Form>
  );
}
