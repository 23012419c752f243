import { Plus, X } from "lucide-react";
import { useFieldArray, type UseFormReturn } from "react-hook-form";
import { Button } from "@/components/ui/button";
import type { CreateStudyForm } from "../api/create-study";

/** The grouping factor's levels as an add/remove list (2 to 20). */
export function LevelsEditor({ form }: { form: UseFormReturn<CreateStudyForm> }) {
  const { fields, append, remove } = useFieldArray({ control: form.control, name: "levels" });
  const error = form.formState.errors.levels;
  const message = error?.message ?? error?.root?.message;
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={message ? "levels-error" : undefined}>
      <legend className="text-sm font-medium">Levels (the groups you will compare)</legend>
      <p className="text-xs text-ink-soft">One name per group, exactly as it will appear in the data file.</p>
      <ol className="flex flex-col gap-2">
        {fields.map((f, i) => (
          <li key={f.id} className="flex items-center gap-2">
            <span className="num w-6 text-right text-sm text-ink-soft">{i + 1}</span>
            <input
              aria-label={`Level ${i + 1}`}
              className="flex-1 rounded-md border border-ink/25 bg-paper px-3 py-1.5 outline-none focus:border-spruce focus:ring-2 focus:ring-spruce/30"
              {...form.register(`levels.${i}.name` as const)}
            />
            <Button
              variant="quiet"
              aria-label={`Remove level ${i + 1}`}
              disabled={fields.length <= 2}
              onClick={() => remove(i)}
              className="!px-2"
            >
              <X aria-hidden="true" className="h-4 w-4" />
            </Button>
          </li>
        ))}
      </ol>
      <div>
        <Button variant="secondary" disabled={fields.length >= 20} onClick={() => append({ name: "" })}>
          <Plus aria-hidden="true" className="h-4 w-4" /> Add a level
        </Button>
      </div>
      {message && (
        <p id="levels-error" role="alert" className="text-sm text-brick">
          {message}
        </p>
      )}
    </fieldset>
  );
}
