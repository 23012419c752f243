import { Link } from "react-router-dom";
import { formatDateTime } from "@/lib/format";
import { testTitle } from "@/lib/labels";
import { useAnalyses } from "../api/get-analyses";

/**
 * Every stored run of a study, newest first, each with its own address: an earlier run (or a
 * deviation run beside the planned one) can be opened and read next to the primary.
 */
export function AnalysisRuns({
  studyId,
  shownId,
  activeDatasetId,
}: {
  studyId: number;
  shownId: number | null;
  activeDatasetId: number | null;
}) {
  const runs = useAnalyses(studyId);
  if (!runs.data || runs.data.length < 2) return null;
  const sorted = [...runs.data].sort((a, b) => b.id - a.id);
  return (
    <nav aria-labelledby="runs-title" className="rounded-lg bg-paper p-4 text-sm shadow-sm">
      <h4 id="runs-title" className="font-semibold">
        All runs of this study
      </h4>
      <ul className="mt-2 flex flex-col gap-1">
        {sorted.map((a) => (
          <li key={a.id} className="flex flex-wrap items-baseline gap-x-2">
            {a.id === shownId ? (
              <span className="font-semibold">Analysis {a.id} (shown)</span>
            ) : (
              <Link className="text-lake underline" to={`?analysis=${a.id}`}>
                Analysis {a.id}
              </Link>
            )}
            <span className="text-ink-soft">
              {testTitle(a.chosenTest)}
              {a.deviation ? " — a deviation from the plan" : " — the plan's primary test"} · data version{" "}
              {a.datasetVersion ?? "—"}
              {a.datasetId === activeDatasetId ? " (active)" : ""} · {formatDateTime(a.createdAt)}
            </span>
          </li>
        ))}
      </ul>
    </nav>
  );
}
