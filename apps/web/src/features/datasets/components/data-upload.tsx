import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { usePreviewDataset } from "../api/preview-dataset";
import {
  planMismatch,
  rejectedReport,
  useUploadDataset,
  type UploadDatasetInput,
} from "../api/upload-dataset";
import type { DatasetDto as Dataset, StudyDto as Study } from "@waymark/contract";
import { ColumnMapping } from "./column-mapping";
import { FilePicker } from "./file-picker";
import { PlanMismatch } from "./plan-mismatch";
import { ProgressBar } from "./progress-bar";
import { ValidationReport } from "./validation-report";

/** Upload flow: pick a file, see its first rows and the guessed columns, upload, read the report. */
export function DataUpload({ study, onUploaded }: { study: Study; onUploaded?: (d: Dataset) => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState(0);
  const preview = usePreviewDataset(study.id, setProgress);
  const upload = useUploadDataset(study.id, setProgress);
  const rejected = rejectedReport(upload.error);
  const mismatch = planMismatch(upload.error);
  // The columns last confirmed, so a refused file can be sent again with a level mapping.
  const [columns, setColumns] = useState<Omit<UploadDatasetInput, "file" | "levelMap"> | null>(null);

  const pick = (f: File) => {
    setFile(f);
    setProgress(0);
    upload.reset();
    preview.mutate(f);
  };
  const reset = () => {
    setFile(null);
    preview.reset();
    upload.reset();
  };

  return (
    <div className="flex flex-col gap-4">
      {(!file || preview.isError) && !upload.isPending && (
        <FilePicker onFile={pick} disabled={preview.isPending} />
      )}
      {(preview.isPending || upload.isPending) && (
        <ProgressBar
          fraction={progress}
          label={upload.isPending ? "Uploading the file" : "Reading the file"}
        />
      )}
      {preview.error && <ErrorPanel title="The file could not be read" message={preview.error.message} />}
      {file && preview.data && !upload.isSuccess && (
        <ColumnMapping
          key={file.name + file.size}
          preview={preview.data}
          fileName={file.name}
          busy={upload.isPending}
          onCancel={reset}
          onConfirm={(m) => {
            setProgress(0);
            setColumns(m);
            upload.mutate({ file, ...m }, { onSuccess: (d) => onUploaded?.(d) });
          }}
        />
      )}
      {mismatch && file && columns && (
        <PlanMismatch
          key={JSON.stringify(mismatch)}
          details={mismatch}
          levels={study.levels}
          busy={upload.isPending}
          onResend={(levelMap) => {
            setProgress(0);
            upload.mutate({ file, ...columns, levelMap }, { onSuccess: (d) => onUploaded?.(d) });
          }}
        />
      )}
      {rejected && <ValidationReport report={rejected} levels={study.levels} stored={false} />}
      {upload.error && !rejected && !mismatch && (
        <ErrorPanel title="The file was not stored" message={upload.error.message} />
      )}
      {upload.data && (
        <div className="flex flex-col gap-3">
          <p role="status" className="font-medium text-spruce">
            Stored as version {upload.data.version} of the data. What was read is shown below.
          </p>
          <button type="button" onClick={reset} className="self-start text-sm text-lake hover:underline">
            Upload another version
          </button>
        </div>
      )}
    </div>
  );
}
