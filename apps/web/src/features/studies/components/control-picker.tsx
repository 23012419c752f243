import { useId } from "react";

/** Which level is the control, when the analyst says there is one. */
export function ControlPicker({
  levels,
  value,
  onChange,
  disabled,
}: {
  levels: string[];
  value: string | null;
  onChange: (level: string) => void;
  disabled?: boolean;
}) {
  const id = useId();
  return (
    <div className="mt-4 flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        Which level is the control?
      </label>
      <select
        id={id}
        value={value ?? ""}
        disabled={disabled}
        onChange={(e) => e.target.value && onChange(e.target.value)}
        className="w-72 rounded-md border border-ink/25 bg-paper px-3 py-2"
      >
        <option value="">Choose a level…</option>
        {levels.map((l) => (
          <option key={l} value={l}>
            {l}
          </option>
        ))}
      </select>
    </div>
  );
}
