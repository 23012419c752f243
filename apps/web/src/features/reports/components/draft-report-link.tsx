import { FileDown } from "lucide-react";
import { reportDocxHref } from "../api/keys";

/**
 * For the analyst's own study: the watermarked draft of the methods-and-results section as DOCX.
 * A plain download link; the server refuses it to anyone but the owning analyst.
 */
export function DraftReportLink({ studyId, className = "" }: { studyId: number; className?: string }) {
  return (
    <a
      href={reportDocxHref(studyId, true)}
      download
      className={`inline-flex items-center gap-1.5 rounded-md border border-ink/25 bg-paper px-3 py-1.5 text-sm font-semibold text-ink no-underline hover:border-ink/50 hover:no-underline ${className}`}
      data-testid="draft-report-link"
    >
      <FileDown aria-hidden="true" className="h-4 w-4" /> Download draft (not approved)
    </a>
  );
}
