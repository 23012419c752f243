import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { PlanMismatchDetails } from "@waymark/contract";

const LEAVE_OUT = "__leave-out__";
const quote = (xs: string[]) => xs.map((x) => `“${x}”`).join(", ");

/**
 * An upload the server refused because it does not match the locked plan: what is missing, too
 * small or not in the plan, and the near-miss names it offers to map. The analyst confirms a
 * mapping (or leaves an unplanned group out on purpose) and the file is sent again with it.
 */
export function PlanMismatch({
  details,
  levels,
  busy,
  onResend,
}: {
  details: PlanMismatchDetails;
  levels: string[];
  busy: boolean;
  onResend: (levelMap: Record<string, string | null>) => void;
}) {
  const offered = new Map(details.suggestions.map((s) => [s.found, s.planned]));
  // Every unplanned name gets a choice: the suggested level when there is one, else "leave out".
  const names = [...new Set([...details.suggestions.map((s) => s.found), ...details.unplanned])];
  const [choice, setChoice] = useState<Record<string, string>>(() =>
    Object.fromEntries(names.map((n) => [n, offered.get(n) ?? LEAVE_OUT])),
  );
  const mapped = new Set(Object.values(choice).filter((v) => v !== LEAVE_OUT));
  const stillMissing = details.missing.filter((m) => !mapped.has(m));

  return (
    <section
      aria-labelledby="mismatch-title"
      data-testid="plan-mismatch"
      className="rounded-lg border-l-4 border-brick bg-paper p-4 shadow-sm"
    >
      <h3 id="mismatch-title" className="font-semibold text-brick">
        The data do not match the plan; nothing was stored
      </h3>
      <ul className="mt-2 list-disc pl-5 text-sm">
        {details.missing.length > 0 && (
          <li>
            No data for the planned level{details.missing.length > 1 ? "s" : ""} {quote(details.missing)}.
          </li>
        )}
        {details.tooSmall.map((t) => (
          <li key={t.level}>
            “{t.level}” has {t.n} value{t.n === 1 ? "" : "s"}; every group needs at least two.
          </li>
        ))}
        {details.unplanned.length > 0 && (
          <li>
            The file has group{details.unplanned.length > 1 ? "s" : ""} the plan does not name:{" "}
            {quote(details.unplanned)}.
          </li>
        )}
      </ul>
      {names.length > 0 && (
        <form
          className="mt-3 flex flex-col gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            onResend(Object.fromEntries(names.map((n) => [n, choice[n] === LEAVE_OUT ? null : choice[n]!])));
          }}
        >
          <p className="text-sm font-medium">Say what each name in the file means:</p>
          {names.map((n) => (
            <label key={n} className="flex flex-wrap items-center gap-2 text-sm">
              <span className="break-all">“{n}” in the file is</span>
              <select
                value={choice[n]}
                onChange={(e) => setChoice((c) => ({ ...c, [n]: e.target.value }))}
                className="rounded-md border border-ink/25 bg-paper px-2 py-1"
                aria-label={`What “${n}” means`}
              >
                {levels.map((l) => (
                  <option key={l} value={l}>
                    the planned level “{l}”{offered.get(n) === l ? " (suggested)" : ""}
                  </option>
                ))}
                <option value={LEAVE_OUT}>not part of the study: leave it out</option>
              </select>
            </label>
          ))}
          {stillMissing.length > 0 && (
            <p className="text-sm text-amber-800">
              With this mapping {quote(stillMissing)} still {stillMissing.length > 1 ? "have" : "has"} no
              data; the server will refuse the file again.
            </p>
          )}
          <div>
            <Button type="submit" disabled={busy}>
              {busy ? "Uploading…" : "Upload again with this mapping"}
            </Button>
          </div>
        </form>
      )}
    </section>
  );
}
