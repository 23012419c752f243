import { useState } from "react";
import { z } from "zod";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { TextField } from "@/components/ui/text-field";
import { formatAlpha } from "@/lib/format";
import { useComputePower, type PowerBody } from "../api/compute-power";
import type { PowerResponse as PowerResult, StudyDto as Study } from "@waymark/contract";
import { PowerCurvePlot } from "./power-curve-plot";

export const powerFormSchema = z
  .object({
    solveFor: z.enum(["n", "power"]),
    effectBy: z.enum(["f", "means"]),
    k: z
      .number({ error: "Enter the number of groups" })
      .int("The number of groups is a whole number")
      .min(2, "At least 2 groups")
      .max(20, "At most 20 groups"),
    effectF: z.number({ error: "Enter Cohen's f, for example 0.25" }),
    means: z.string(),
    sd: z.number({ error: "Enter the common SD" }),
    targetPower: z.number({ error: "Enter the target power, for example 0.80" }),
    n: z.number({ error: "Enter n per group" }),
  })
  .superRefine((v, ctx) => {
    if (v.effectBy === "f") {
      if (!(v.effectF > 0))
        ctx.addIssue({ code: "custom", path: ["effectF"], message: "Cohen's f must be above 0" });
      else if (v.effectF > 2)
        ctx.addIssue({
          code: "custom",
          path: ["effectF"],
          message: "Cohen's f above 2 is implausibly large; check the value",
        });
    } else {
      const parts = v.means.split(/[,;\s]+/).filter(Boolean);
      const bad = parts.find((p) => !Number.isFinite(Number(p)));
      if (bad) ctx.addIssue({ code: "custom", path: ["means"], message: `“${bad}” is not a number` });
      else if (parts.length !== v.k)
        ctx.addIssue({
          code: "custom",
          path: ["means"],
          message: `Enter one expected mean per group: ${v.k} needed, ${parts.length} given`,
        });
      else if (new Set(parts.map(Number)).size < 2)
        ctx.addIssue({
          code: "custom",
          path: ["means"],
          message: "The expected means must not all be equal",
        });
      if (!(v.sd > 0))
        ctx.addIssue({ code: "custom", path: ["sd"], message: "The common SD must be above 0" });
    }
    if (v.solveFor === "n" && !(v.targetPower >= 0.5 && v.targetPower <= 0.99))
      ctx.addIssue({
        code: "custom",
        path: ["targetPower"],
        message: "Target power must be between 0.50 and 0.99",
      });
    if (v.solveFor === "power" && !(Number.isInteger(v.n) && v.n >= 2))
      ctx.addIssue({
        code: "custom",
        path: ["n"],
        message: "n per group must be a whole number of at least 2",
      });
  });
export type PowerFormValues = z.infer<typeof powerFormSchema>;

export function toPowerBody(v: PowerFormValues, alpha: number): PowerBody {
  const body: PowerBody = { k: v.k, alpha };
  if (v.effectBy === "f") body.effectF = v.effectF;
  else {
    body.means = v.means
      .split(/[,;\s]+/)
      .filter(Boolean)
      .map(Number);
    body.sd = v.sd;
  }
  if (v.solveFor === "n") body.power = v.targetPower;
  else body.n = v.n;
  return body;
}

/** Sample size for the omnibus test: from an effect (Cohen's f, or expected means with a common SD) to n per group, or from n to power. */
/** Saving the chosen sample size into the study's plan; the page passes the plan's mutation. */
export interface PlanSaver {
  mutate: (body: { power: { effectF: number; targetPower: number } }) => void;
  isPending: boolean;
  isSuccess: boolean;
  error: Error | null;
}

export function PowerCalculator({
  study,
  editable,
  save,
}: {
  study: Study;
  editable: boolean;
  save: PlanSaver;
}) {
  const compute = useComputePower();
  const [result, setResult] = useState<{ res: PowerResult; target: number; solveFor: "n" | "power" } | null>(
    null,
  );
  const alpha = study.plan.alpha;
  const defaults: PowerFormValues = {
    solveFor: "n",
    effectBy: "f",
    k: study.levels.length,
    effectF: study.plan.power?.effectF ?? 0.25,
    means: "",
    sd: 1,
    targetPower: study.plan.power?.targetPower ?? 0.8,
    n: 10,
  };
  return (
    <section aria-labelledby="power-title" className="rounded-lg bg-paper p-5 shadow-sm">
      <h3 id="power-title" className="font-semibold">
        Sample size
      </h3>
      <p className="mt-1 max-w-prose text-sm text-ink-soft">
        How many units per group the omnibus test needs to find an effect of a given size, at α ={" "}
        {formatAlpha(alpha)}. Cohen's f is the spread of the group means divided by the common SD; .10, .25
        and .40 are often read as small, medium and large.
      </p>
      <Form
        schema={powerFormSchema}
        defaultValues={defaults}
        aria-label="Sample size calculator"
        className="mt-4 flex flex-col gap-4"
        onSubmit={(v) =>
          compute.mutate(toPowerBody(v, alpha), {
            onSuccess: (res) => setResult({ res, target: v.targetPower, solveFor: v.solveFor }),
          })
        }
      >
        {({ register, formState, watch }) => {
          const e = formState.errors;
          const effectBy = watch("effectBy");
          const solveFor = watch("solveFor");
          return (
            <>
              <div className="flex flex-wrap gap-6 text-sm">
                <fieldset className="flex flex-col gap-1">
                  <legend className="font-medium">Find</legend>
                  <label className="flex items-center gap-2">
                    <input type="radio" value="n" {...register("solveFor")} /> n per group for a target power
                  </label>
                  <label className="flex items-center gap-2">
                    <input type="radio" value="power" {...register("solveFor")} /> the power of a given n
                  </label>
                </fieldset>
                <fieldset className="flex flex-col gap-1">
                  <legend className="font-medium">Effect given as</legend>
                  <label className="flex items-center gap-2">
                    <input type="radio" value="f" {...register("effectBy")} /> a single Cohen's f
                  </label>
                  <label className="flex items-center gap-2">
                    <input type="radio" value="means" {...register("effectBy")} /> expected means and a common
                    SD
                  </label>
                </fieldset>
              </div>
              <div className="grid gap-4 sm:grid-cols-3">
                <TextField
                  label="Groups k"
                  type="number"
                  error={e.k?.message}
                  {...register("k", { valueAsNumber: true })}
                />
                {effectBy === "f" ? (
                  <TextField
                    label="Cohen's f"
                    type="number"
                    step="0.01"
                    error={e.effectF?.message}
                    {...register("effectF", { valueAsNumber: true })}
                  />
                ) : (
                  <>
                    <TextField
                      label="Expected means"
                      hint="Comma-separated, one per group"
                      error={e.means?.message}
                      {...register("means")}
                    />
                    <TextField
                      label="Common SD"
                      type="number"
                      step="any"
                      error={e.sd?.message}
                      {...register("sd", { valueAsNumber: true })}
                    />
                  </>
                )}
                {solveFor === "n" ? (
                  <TextField
                    label="Target power"
                    type="number"
                    step="0.01"
                    error={e.targetPower?.message}
                    {...register("targetPower", { valueAsNumber: true })}
                  />
                ) : (
                  <TextField
                    label="n per group"
                    type="number"
                    error={e.n?.message}
                    {...register("n", { valueAsNumber: true })}
                  />
                )}
              </div>
              <div>
                <Button type="submit" variant="secondary" disabled={compute.isPending}>
                  {compute.isPending ? "Calculating…" : "Calculate"}
                </Button>
              </div>
            </>
          );
        }}
      </Form>
      {compute.error && (
        <div className="mt-3">
          <ErrorPanel title="The calculation failed" message={compute.error.message} />
        </div>
      )}
      {result && (
        <div className="mt-4 flex flex-col gap-3" aria-live="polite">
          <p className="max-w-prose" data-testid="power-answer">
            {result.solveFor === "n" ? (
              <>
                To find an effect of f = <span className="tabular-nums">{result.res.effectF.toFixed(2)}</span>{" "}
                with {Math.round(result.target * 100)}% power in {result.res.k} groups, plan{" "}
                <strong className="tabular-nums">n = {result.res.nPerGroup} per group</strong> (
                {result.res.totalN} in total); that n gives {Math.round(result.res.power * 100)}% power.
              </>
            ) : (
              <>
                With <span className="tabular-nums">n = {result.res.nPerGroup}</span> per group (
                {result.res.totalN} in total), the chance of finding an effect of f ={" "}
                <span className="tabular-nums">{result.res.effectF.toFixed(2)}</span> is{" "}
                <strong className="tabular-nums">{Math.round(result.res.power * 100)}%</strong>.
              </>
            )}
          </p>
          <PowerCurvePlot
            curve={result.res.curve}
            marked={{ n: result.res.nPerGroup, power: result.res.power }}
            target={result.solveFor === "n" ? result.target : undefined}
          />
          {editable && (
            <div className="flex items-center gap-3">
              <Button
                disabled={save.isPending}
                onClick={() =>
                  save.mutate({
                    power: {
                      effectF: result.res.effectF,
                      targetPower:
                        result.solveFor === "n"
                          ? result.target
                          : Math.min(0.99, Math.max(0.5, result.res.power)),
                    },
                  })
                }
              >
                Use this sample size in the plan
              </Button>
              {save.isSuccess && (
                <span role="status" className="text-sm text-spruce">
                  Saved to the plan.
                </span>
              )}
            </div>
          )}
          {save.error && <ErrorPanel title="The sample size was not saved" message={save.error.message} />}
        </div>
      )}
    </section>
  );
}
