import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { formatBytes, formatDateTime } from "@/lib/format";
import type { DatasetListItem } from "@waymark/contract";
import { ShortHash } from "@/components/ui/short-hash";
import { useActivateDataset } from "../api/activate-dataset";

/**
 * Every uploaded version of the data, newest first, with its fingerprint. The active one (what
 * analyses and the submission use) is marked; the analyst may make another one active again.
 */
export function DatasetVersions({
  studyId,
  datasets,
  canActivate = false,
}: {
  studyId: number;
  datasets: DatasetListItem[];
  canActivate?: boolean;
}) {
  const activate = useActivateDataset(studyId);
  if (datasets.length === 0) return <p className="text-sm text-ink-soft">No data uploaded yet.</p>;
  const sorted = [...datasets].sort((a, b) => b.version - a.version);
  return (
    <div className="flex flex-col gap-2">
      {activate.error && (
        <ErrorPanel title="The version was not made active" message={activate.error.message} />
      )}
      <div className="relative max-w-full overflow-x-auto rounded-lg bg-paper shadow-sm">
        <table className="w-full text-sm">
          <caption className="sr-only">Data versions</caption>
          <thead className="border-b border-ink/15 text-left text-ink-soft">
            <tr>
              <th className="p-2 font-medium">Version</th>
              <th className="p-2 font-medium">In use</th>
              <th className="p-2 font-medium">File</th>
              <th className="p-2 text-right font-medium">Size</th>
              <th className="p-2 font-medium">SHA-256</th>
              <th className="p-2 font-medium">Uploaded by</th>
              <th className="p-2 font-medium">When</th>
              <th className="p-2 font-medium">Timing</th>
            </tr>
          </thead>
          <tbody>
            {sorted.map((d) => (
              <tr
                key={d.id}
                data-testid={`version-${d.version}`}
                className={`border-b border-ink/5 last:border-0 ${d.active ? "bg-spruce-100/50" : ""}`}
              >
                <td className="num p-2">v{d.version}</td>
                <td className="p-2">
                  {d.active ? (
                    <span className="rounded-sm bg-spruce px-1.5 py-0.5 text-xs font-semibold text-stone">
                      Active
                    </span>
                  ) : canActivate ? (
                    <Button
                      variant="secondary"
                      className="px-2 py-1 text-xs"
                      disabled={activate.isPending}
                      onClick={() => activate.mutate(d.id)}
                      aria-label={`Make version ${d.version} active`}
                    >
                      Make active
                    </Button>
                  ) : (
                    <span className="text-ink-soft">—</span>
                  )}
                </td>
                <td className="p-2">{d.fileName}</td>
                <td className="num whitespace-nowrap p-2 text-right">{formatBytes(d.sizeBytes)}</td>
                <td className="p-2">
                  <ShortHash hash={d.sha256} label="SHA-256" />
                </td>
                <td className="p-2">{d.uploadedBy?.displayName ?? "—"}</td>
                <td className="num whitespace-nowrap p-2">{formatDateTime(d.uploadedAt)}</td>
                <td className="p-2">
                  {d.afterPlanLock ? (
                    <span className="rounded-sm bg-spruce-100 px-1.5 py-0.5 text-xs font-semibold text-spruce">
                      after plan lock
                    </span>
                  ) : (
                    <span className="rounded-sm bg-amber-100 px-1.5 py-0.5 text-xs font-semibold text-amber-800">
                      before plan lock
                    </span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
