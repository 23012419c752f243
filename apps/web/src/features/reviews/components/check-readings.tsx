import { Check } from "lucide-react";
import { AttentionMarker } from "@/components/ui/attention-marker";
import type { Reading as CheckReading } from "@waymark/stats/result";

const TITLES: Record<string, string> = {
  normality: "Shape of the data",
  spread: "Spread across groups",
  outliers: "Unusual values",
  sizes: "Group sizes",
};

/** One line per assumption check, the ones needing attention marked in amber with words. */
export function CheckReadings({ readings }: { readings: CheckReading[] }) {
  if (readings.length === 0)
    return <p className="text-sm text-ink-soft">No check readings were returned for these data.</p>;
  return (
    <ul className="flex flex-col gap-2" aria-label="Assumption checks" data-testid="check-readings">
      {readings.map((r) => (
        <li
          key={r.key}
          className={`rounded-md p-3 text-sm ${r.level === "attention" ? "border-l-4 border-amber bg-amber-100/60" : "bg-stone"}`}
        >
          <p className="flex flex-wrap items-center gap-2 font-semibold">
            {TITLES[r.key] ?? r.key}
            {r.level === "attention" ? (
              <AttentionMarker>Needs attention</AttentionMarker>
            ) : (
              <span className="inline-flex items-center gap-1 text-xs font-semibold text-spruce">
                <Check aria-hidden="true" className="h-3.5 w-3.5" /> Fine
              </span>
            )}
          </p>
          <p className="mt-1">{r.text}</p>
        </li>
      ))}
    </ul>
  );
}
