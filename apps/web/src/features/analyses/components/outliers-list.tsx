import { formatStat, formatValue } from "@/lib/format";
import { isAvailable, reasonOf, type Maybe } from "@/lib/result-values";
import type { FlaggedValue, OutlierReport as OutlierPart } from "@waymark/stats/result";
import { AttentionMark } from "@/components/ui/attention-mark";

function Flagged({ items, kind }: { items: FlaggedValue[]; kind: string }) {
  return (
    <>
      {items.map((f) => (
        <li key={`${kind}-${f.row}`} className="num">
          row {f.row}: {formatValue(f.value)}
          {typeof f.studentizedResidual === "number" && Number.isFinite(f.studentizedResidual) && (
            <span className="font-sans text-ink-soft">
              {" "}
              (studentized residual {formatStat(f.studentizedResidual)})
            </span>
          )}{" "}
          <AttentionMark label={kind} />
        </li>
      ))}
    </>
  );
}

/** Values flagged by Tukey's fences or by large studentized residuals, with their row numbers. */
export function OutliersList({ outliers }: { outliers: Maybe<OutlierPart> }) {
  if (!isAvailable(outliers)) return <p className="text-sm text-ink-soft">{reasonOf(outliers)}</p>;
  const groups = (outliers.groups ?? []).filter(
    (g) => (g.mild?.length ?? 0) + (g.extreme?.length ?? 0) + (g.largeResidual?.length ?? 0) > 0,
  );
  if (groups.length === 0)
    return (
      <p className="text-sm">
        No value lies beyond 1.5 IQR from its group's quartiles, and no studentized residual exceeds ±3.
      </p>
    );
  return (
    <ul className="flex flex-col gap-3 text-sm">
      {groups.map((g) => {
        const extremeRows = new Set((g.extreme ?? []).map((f) => f.row));
        const mildRows = new Set((g.mild ?? []).map((f) => f.row));
        const residualOnly = (g.largeResidual ?? []).filter(
          (f) => !extremeRows.has(f.row) && !mildRows.has(f.row),
        );
        return (
          <li key={g.group}>
            <p className="font-medium">{g.group}</p>
            <ul className="mt-1 flex flex-col gap-1 pl-3">
              <Flagged items={g.extreme ?? []} kind="beyond 3 IQR" />
              <Flagged items={g.mild ?? []} kind="beyond 1.5 IQR" />
              <Flagged items={residualOnly} kind="large residual" />
            </ul>
          </li>
        );
      })}
    </ul>
  );
}
