import { Upload } from "lucide-react";
import { useId, useState, type DragEvent } from "react";

const ACCEPT = ".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

/** Choose a CSV or XLSX file by browsing or by dropping it on the area. */
export function FilePicker({ onFile, disabled }: { onFile: (file: File) => void; disabled?: boolean }) {
  const id = useId();
  const [over, setOver] = useState(false);
  const [wrong, setWrong] = useState<string | null>(null);
  const take = (file: File | undefined) => {
    if (!file) return;
    if (!/\.(csv|xlsx)$/i.test(file.name)) {
      setWrong(`“${file.name}” is not a CSV or XLSX file.`);
      return;
    }
    setWrong(null);
    onFile(file);
  };
  const drop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    if (!disabled) take(e.dataTransfer.files[0]);
  };
  return (
    <div>
      <label
        htmlFor={id}
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={drop}
        className={`flex cursor-pointer flex-col items-center gap-2 rounded-lg border-2 border-dashed p-8 text-center ${over ? "border-spruce bg-spruce-100" : "border-ink/25 bg-paper hover:border-spruce"} ${disabled ? "pointer-events-none opacity-60" : ""}`}
      >
        <Upload aria-hidden="true" className="h-6 w-6 text-spruce" />
        <span className="font-medium">Choose a data file, or drop it here</span>
        <span className="text-sm text-ink-soft">
          CSV or XLSX; one row per measured unit, or one column per group
        </span>
      </label>
      <input
        id={id}
        type="file"
        accept={ACCEPT}
        className="sr-only"
        disabled={disabled}
        aria-label="Data file"
        onChange={(e) => take(e.target.files?.[0] ?? undefined)}
      />
      {wrong && (
        <p role="alert" className="mt-2 text-sm text-brick">
          {wrong}
        </p>
      )}
    </div>
  );
}
