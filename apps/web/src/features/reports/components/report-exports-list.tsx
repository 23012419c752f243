import { ErrorPanel } from "@/components/errors/error-panel";
import { formatDateTime } from "@/lib/format";
import { useReportExports } from "../api/get-report-exports";

/** Who downloaded the report and when, newest first. */
export function ReportExportsList({ studyId }: { studyId: number }) {
  const exports = useReportExports(studyId);
  if (exports.isPending) return <p className="text-sm text-ink-soft">Loading the downloads…</p>;
  if (exports.error)
    return <ErrorPanel title="The downloads could not be loaded" message={exports.error.message} />;
  if (exports.data.length === 0)
    return <p className="text-sm text-ink-soft">Nobody has downloaded this report yet.</p>;
  return (
    <ul
      className="flex flex-col divide-y divide-ink/10 text-sm"
      aria-label="Past downloads"
      data-testid="report-exports"
    >
      {exports.data.map((e) => (
        <li key={e.id} className="flex flex-wrap gap-x-2 py-1.5">
          <span className="num text-ink-soft">{formatDateTime(e.at)}</span>
          <span>{e.actorEmail ?? "—"}</span>
          {e.draft && <span className="rounded-sm bg-panel px-1.5 text-xs font-semibold">draft</span>}
        </li>
      ))}
    </ul>
  );
}
