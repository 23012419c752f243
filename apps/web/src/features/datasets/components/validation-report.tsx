import type { ValidationReport as Report } from "@waymark/contract";
import { AttentionMark } from "@/components/ui/attention-mark";

const REASONS: Record<string, string> = {
  missing: "missing value",
  "non-numeric": "not a number",
  "missing-group": "no group given",
  "unknown-level": "group is not a planned level",
};
const MAX_LISTED = 100;

/**
 * What was read from a file: rows read and used, each excluded row with its number and reason,
 * the groups found against the plan's levels (unknown and missing ones flagged) and n per group.
 */
export function ValidationReport({
  report,
  levels,
  stored,
}: {
  report: Report;
  levels: string[];
  stored: boolean;
}) {
  const unknown = new Set(report.unknownLevels);
  const missing = report.missingLevels.filter((l) => !report.groupsFound.some((g) => g.name === l));
  const excluded = Math.max(report.excludedCount ?? 0, report.excluded.length);
  const total = report.groupsFound.reduce((s, g) => s + g.n, 0);
  return (
    <section
      aria-labelledby="report-title"
      className={`rounded-lg p-5 shadow-sm ${stored ? "bg-paper" : "border-l-4 border-brick bg-brick-100"}`}
    >
      <h3 id="report-title" className="font-semibold">
        {stored ? "What was read" : "The file was read but not stored"}
      </h3>
      <p className="mt-1 max-w-prose">
        {report.rowsRead} row{report.rowsRead === 1 ? "" : "s"} read, {report.rowsUsed} used
        {excluded > 0 ? `, ${excluded} excluded` : ", none excluded"}. {total} value{total === 1 ? "" : "s"}{" "}
        in {report.groupsFound.length} group
        {report.groupsFound.length === 1 ? "" : "s"}.
        {!stored && " Fix the problems below and upload the file again; nothing was saved."}
      </p>
      {report.messages.length > 0 && (
        <ul className="mt-2 list-disc pl-5 text-sm">
          {report.messages.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      )}
      <div className="mt-4 grid gap-5 lg:grid-cols-2">
        <div>
          <h4 className="text-sm font-semibold">Groups found and the plan's levels</h4>
          <div className="relative max-w-full overflow-x-auto">
            <table className="mt-2 w-full text-sm">
              <thead className="text-left text-ink-soft">
                <tr>
                  <th className="py-1 pr-3 font-medium">Group</th>
                  <th className="py-1 pr-3 text-right font-medium">n</th>
                  <th className="py-1 font-medium">In the plan?</th>
                </tr>
              </thead>
              <tbody>
                {report.groupsFound.map((g) => (
                  <tr key={g.name} className="border-t border-ink/10">
                    <td className="py-1 pr-3">{g.name}</td>
                    <td className="num py-1 pr-3 text-right">{g.n}</td>
                    <td className="py-1">
                      {unknown.has(g.name) || !levels.includes(g.name) ? (
                        <AttentionMark label="not a planned level" />
                      ) : (
                        "yes"
                      )}
                    </td>
                  </tr>
                ))}
                {missing.map((l) => (
                  <tr key={`missing-${l}`} className="border-t border-ink/10">
                    <td className="py-1 pr-3">{l}</td>
                    <td className="num py-1 pr-3 text-right">0</td>
                    <td className="py-1">
                      <AttentionMark label="planned, not in the file" />
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {report.unknownLevels.length > 0 && (
            <p className="mt-2 text-sm">
              Unknown level{report.unknownLevels.length === 1 ? "" : "s"}:{" "}
              {report.unknownLevels.map((l) => `“${l}”`).join(", ")}. Check the spelling against the plan's
              levels ({levels.join(", ")}).
            </p>
          )}
        </div>
        <div>
          <h4 className="text-sm font-semibold">Rows excluded</h4>
          {excluded === 0 ? (
            <p className="mt-2 text-sm text-ink-soft">Every row with a group was used.</p>
          ) : (
            <div className="relative max-w-full overflow-x-auto">
              <table className="mt-2 w-full text-sm" aria-label="Rows excluded">
                <thead className="text-left text-ink-soft">
                  <tr>
                    <th className="py-1 pr-3 text-right font-medium">Row</th>
                    <th className="py-1 pr-3 font-medium">Column</th>
                    <th className="py-1 pr-3 font-medium">Value</th>
                    <th className="py-1 font-medium">Why</th>
                  </tr>
                </thead>
                <tbody>
                  {report.excluded.slice(0, MAX_LISTED).map((x, i) => (
                    <tr key={`${x.row}-${x.column ?? ""}-${i}`} className="border-t border-ink/10">
                      <td className="num py-1 pr-3 text-right">row {x.row}</td>
                      <td className="py-1 pr-3">{x.column ?? "—"}</td>
                      <td className="num py-1 pr-3">
                        {x.value === null || x.value === undefined || x.value === ""
                          ? "(empty)"
                          : String(x.value)}
                      </td>
                      <td className="py-1">{REASONS[x.reason] ?? x.reason}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          {excluded > Math.min(MAX_LISTED, report.excluded.length) && (
            <p className="mt-1 text-xs text-ink-soft">
              The first {Math.min(MAX_LISTED, report.excluded.length)} of {excluded} are listed.
            </p>
          )}
        </div>
      </div>
    </section>
  );
}
