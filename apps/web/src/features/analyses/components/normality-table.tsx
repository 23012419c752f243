import { formatP, formatStat } from "@/lib/format";
import { isAvailable, num, reasonOf, type Maybe } from "@/lib/result-values";
import type {
  ShapiroWilkResidualsPart as ShapiroPart,
  ShapiroWilkGroup as ShapiroRow,
} from "@waymark/stats/result";
import { AttentionMark } from "@/components/ui/attention-mark";
import { S } from "./stat-symbol";

function Row({
  label,
  n,
  row,
  alpha,
}: {
  label: string;
  n?: number;
  row: Maybe<ShapiroPart> | ShapiroRow | undefined;
  alpha: number;
}) {
  const s = isAvailable(row) ? row : null;
  const ok = !!s && num(s.W) !== null && num(s.p) !== null;
  return (
    <tr className="border-t border-ink/10">
      <th scope="row" className="py-1 pr-4 text-left font-medium">
        {label}
      </th>
      <td className="num py-1 pr-4 text-right">{num(n) ?? num(s?.n) ?? "—"}</td>
      {ok && s ? (
        <>
          <td className="num py-1 pr-4 text-right">{formatStat(s.W, 3)}</td>
          <td className="num py-1">
            <S>p</S> {formatP(s.p)}
            {s.p < alpha && <AttentionMark label="below α" />}
          </td>
        </>
      ) : (
        <td colSpan={2} className="py-1 text-ink-soft">
          {reasonOf(row, "Not computed.")}
        </td>
      )}
    </tr>
  );
}

/** Shapiro–Wilk per group and on the pooled residuals. */
export function NormalityTable({
  perGroup,
  residuals,
  alpha,
}: {
  perGroup: Maybe<ShapiroRow[]>;
  residuals: Maybe<ShapiroPart>;
  alpha: number;
}) {
  return (
    <div className="relative max-w-full overflow-x-auto">
      <table className="whitespace-nowrap text-sm">
        <caption className="mb-1 text-left text-xs text-ink-soft">
          Shapiro–Wilk test; a small p suggests the values are not normally distributed.
        </caption>
        <thead className="text-ink-soft">
          <tr>
            <th className="pr-4 text-left font-medium">Values</th>
            <th className="pr-4 text-right font-medium">
              <S>n</S>
            </th>
            <th className="pr-4 text-right font-medium">
              <S>W</S>
            </th>
            <th className="text-left font-medium">
              <S>p</S>
            </th>
          </tr>
        </thead>
        <tbody>
          <Row label="Residuals, all groups" row={residuals} alpha={alpha} />
          {isAvailable(perGroup) ? (
            perGroup.map((r, i) => (
              <Row key={r.group ?? i} label={r.group ?? `Group ${i + 1}`} n={r.n} row={r} alpha={alpha} />
            ))
          ) : (
            <tr>
              <td colSpan={4} className="py-1 text-ink-soft">
                {reasonOf(perGroup)}
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  );
}
