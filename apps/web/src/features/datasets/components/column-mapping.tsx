import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import type { DatasetPreview, Layout } from "@waymark/contract";

export interface Mapping {
  layout: Layout;
  groupColumn: string;
  outcomeColumn: string;
}

/** The first rows of the file and the columns Waymark guessed, which the analyst can change. */
export function ColumnMapping({
  preview,
  fileName,
  onConfirm,
  onCancel,
  busy,
}: {
  preview: DatasetPreview;
  fileName: string;
  onConfirm: (m: Mapping) => void;
  onCancel: () => void;
  busy?: boolean;
}) {
  const [layout, setLayout] = useState<Layout>(preview.guess.layout);
  const [groupColumn, setGroup] = useState(preview.guess.groupColumn ?? preview.columns[0] ?? "");
  const [outcomeColumn, setOutcome] = useState(preview.guess.outcomeColumn ?? preview.columns[1] ?? "");
  const gid = useId();
  const oid = useId();
  const same = layout === "long" && groupColumn === outcomeColumn;
  return (
    <section aria-labelledby="preview-title" className="rounded-lg bg-paper p-5 shadow-sm">
      <h3 id="preview-title" className="font-semibold">
        {fileName}: first rows of {preview.rowCount}
      </h3>
      <div className="mt-3 overflow-x-auto">
        <table className="text-sm" aria-label="First rows of the file">
          <thead>
            <tr className="border-b border-ink/15 text-left">
              {preview.columns.map((c) => (
                <th
                  key={c}
                  className={`px-2 py-1 font-semibold ${layout === "long" && (c === groupColumn || c === outcomeColumn) ? "text-spruce" : ""}`}
                >
                  {c}
                  {layout === "long" && c === groupColumn ? (
                    <span className="ml-1 text-xs font-normal">(group)</span>
                  ) : null}
                  {layout === "long" && c === outcomeColumn ? (
                    <span className="ml-1 text-xs font-normal">(outcome)</span>
                  ) : null}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {preview.rows.map((r, i) => (
              <tr key={i} className="border-b border-ink/5">
                {preview.columns.map((c, j) => (
                  <td key={c} className="num px-2 py-1">
                    {r[j] ?? ""}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <fieldset className="mt-4 flex flex-col gap-1 text-sm">
        <legend className="font-medium">How the file is laid out</legend>
        <label className="flex items-center gap-2">
          <input type="radio" name="layout" checked={layout === "long"} onChange={() => setLayout("long")} />{" "}
          One row per unit: a group column and an outcome column
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" name="layout" checked={layout === "wide"} onChange={() => setLayout("wide")} />{" "}
          One column per group, each holding that group's values
        </label>
      </fieldset>
      {layout === "long" && (
        <div className="mt-3 flex flex-wrap gap-4 text-sm">
          <ColumnSelect
            id={gid}
            label="Group column"
            value={groupColumn}
            columns={preview.columns}
            onChange={setGroup}
          />
          <ColumnSelect
            id={oid}
            label="Outcome column"
            value={outcomeColumn}
            columns={preview.columns}
            onChange={setOutcome}
          />
        </div>
      )}
      {same && (
        <p role="alert" className="mt-2 text-sm text-brick">
          The group and the outcome must be different columns.
        </p>
      )}
      <div className="mt-4 flex gap-2">
        <Button disabled={busy || same} onClick={() => onConfirm({ layout, groupColumn, outcomeColumn })}>
          {busy ? "Uploading…" : "Upload this file"}
        </Button>
        <Button variant="secondary" disabled={busy} onClick={onCancel}>
          Choose another file
        </Button>
      </div>
    </section>
  );
}

/** One column chooser: a labelled list of the file's columns. */
function ColumnSelect({
  id,
  label,
  value,
  columns,
  onChange,
}: {
  id: string;
  label: string;
  value: string;
  columns: readonly string[];
  onChange: (column: string) => void;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        className="rounded-md border border-ink/25 bg-paper px-3 py-1.5"
      >
        {columns.map((c) => (
          <option key={c} value={c}>
            {c}
          </option>
        ))}
      </select>
    </div>
  );
}
