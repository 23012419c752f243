import { forwardRef, useId, type SelectHTMLAttributes } from "react";

interface Props extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  options: readonly { value: string; label: string }[];
  error?: string;
  hint?: string;
  /** Hide the label visually (it stays for screen readers), e.g. inside a table row. */
  hideLabel?: boolean;
}

/** A labelled drop-down whose error is announced and tied to the field. */
export const SelectField = forwardRef<HTMLSelectElement, Props>(function SelectField(
  { label, options, error, hint, hideLabel, id, className = "", ...props },
  ref,
) {
  const auto = useId();
  const inputId = id ?? auto;
  const describedBy = error ? `${inputId}-error` : hint ? `${inputId}-hint` : undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className={hideLabel ? "sr-only" : "text-sm font-medium"}>
        {label}
      </label>
      <select
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`rounded-md border bg-paper px-3 py-2 text-ink outline-none focus:border-spruce focus:ring-2 focus:ring-spruce/30 ${error ? "border-brick" : "border-ink/25"} ${className}`}
        {...props}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {hint && !error && (
        <p id={`${inputId}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${inputId}-error`} role="alert" className="text-sm text-brick">
          {error}
        </p>
      )}
    </div>
  );
});
