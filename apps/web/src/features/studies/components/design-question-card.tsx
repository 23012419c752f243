import { useId } from "react";
import type { DesignQuestion } from "../design-questions";

interface Props {
  question: DesignQuestion;
  value: string | undefined;
  onAnswer: (value: string) => void;
  disabledValues?: Record<string, string>;
  disabled?: boolean;
}

/** One design question: the question, why it is asked, and the answers as large choices. */
export function DesignQuestionCard({ question, value, onAnswer, disabledValues = {}, disabled }: Props) {
  const name = useId();
  return (
    <fieldset disabled={disabled}>
      <legend className="text-xl font-semibold">{question.question}</legend>
      <p className="mt-1 text-sm text-ink-soft">
        <span className="font-medium text-ink">Why we ask:</span> {question.why}
      </p>
      <div className="mt-4 flex flex-col gap-2">
        {question.options.map((o) => {
          const blocked = disabledValues[o.value];
          const checked = value === o.value;
          return (
            <label
              key={o.value}
              className={`flex cursor-pointer items-start gap-3 rounded-md border p-3 ${checked ? "border-spruce bg-spruce-100" : "border-ink/20 bg-paper hover:border-ink/40"} ${blocked ? "cursor-not-allowed opacity-60" : ""}`}
            >
              <input
                type="radio"
                name={name}
                value={o.value}
                checked={checked}
                disabled={!!blocked}
                onChange={() => onAnswer(o.value)}
                className="mt-1 accent-spruce"
              />
              <span>
                <span className="block font-medium">{o.label}</span>
                <span className="block text-sm text-ink-soft">{blocked ?? o.detail}</span>
              </span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
