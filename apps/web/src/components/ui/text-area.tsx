import { forwardRef, useId, type TextareaHTMLAttributes } from "react";

interface Props extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: string;
  error?: string;
  hint?: string;
}

/** A labelled multi-line input whose error is announced and tied to the field. */
export const TextArea = forwardRef<HTMLTextAreaElement, Props>(function TextArea(
  { label, error, hint, id, rows = 3, ...props },
  ref,
) {
  const auto = useId();
  const inputId = id ?? auto;
  const describedBy =
    [hint ? `${inputId}-hint` : null, error ? `${inputId}-error` : null].filter(Boolean).join(" ") ||
    undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className="text-sm font-medium">
        {label}
      </label>
      {hint && (
        <p id={`${inputId}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      <textarea
        ref={ref}
        id={inputId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`rounded-md border bg-paper px-3 py-2 text-ink outline-none focus:border-spruce focus:ring-2 focus:ring-spruce/30 ${error ? "border-brick" : "border-ink/25"}`}
        {...props}
      />
      {error && (
        <p id={`${inputId}-error`} role="alert" className="text-sm text-brick">
          {error}
        </p>
      )}
    </div>
  );
});
