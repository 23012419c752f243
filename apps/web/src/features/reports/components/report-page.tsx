import { useQueryClient } from "@tanstack/react-query";
import { FileDown } from "lucide-react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { ApiError } from "@/lib/api-client";
import { useReportPreview } from "../api/get-report-preview";
import { reportDocxHref, reportKeys } from "../api/keys";
import { CopyMethodsButton } from "./copy-methods-button";
import { ReportBlocks } from "./report-blocks";
import { ReportExportsList } from "./report-exports-list";

/** One approved study's report: the preview, the DOCX download, copy-as-text and past downloads. */
export function ReportPage({ studyId }: { studyId: number }) {
  const preview = useReportPreview(studyId);
  const qc = useQueryClient();
  if (preview.isPending) return <p className="text-ink-soft">Building the report preview…</p>;
  if (preview.error) {
    const notYet = preview.error instanceof ApiError && preview.error.status === 409;
    return (
      <ErrorPanel
        title={notYet ? "The report is not ready" : "The report could not be loaded"}
        message={preview.error.message}
      />
    );
  }
  const blocks = Array.isArray(preview.data.report?.blocks) ? preview.data.report.blocks : [];
  const titleBlock = blocks.find((b) => b.type === "heading" && b.level === 1);
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_16rem]">
      <div className="min-w-0">
        <ReportBlocks blocks={blocks} />
      </div>
      <aside className="flex flex-col gap-4 lg:sticky lg:top-4 lg:self-start">
        <div className="flex flex-col gap-3 rounded-lg bg-paper p-4 shadow-sm">
          <h2 className="font-semibold">Take it away</h2>
          {preview.data.approved ? (
            <a
              href={reportDocxHref(studyId)}
              download
              onClick={() =>
                setTimeout(() => void qc.invalidateQueries({ queryKey: reportKeys.exports(studyId) }), 1500)
              }
              className="inline-flex items-center justify-center gap-2 rounded-md bg-spruce px-4 py-2 text-sm font-semibold text-stone no-underline hover:bg-spruce-700 hover:no-underline"
              aria-label={`Download DOCX${titleBlock && titleBlock.type === "heading" ? ` of ${titleBlock.text}` : ""}`}
            >
              <FileDown aria-hidden="true" className="h-4 w-4" /> Download DOCX
            </a>
          ) : (
            <p className="rounded-md border-l-4 border-amber bg-amber-100 p-2 text-sm">
              This is a draft; the DOCX of record is available once the study is approved.
            </p>
          )}
          <CopyMethodsButton blocks={blocks} />
        </div>
        <div className="rounded-lg bg-paper p-4 shadow-sm">
          <h2 className="mb-2 font-semibold">Past downloads</h2>
          <ReportExportsList studyId={studyId} />
        </div>
      </aside>
    </div>
  );
}
