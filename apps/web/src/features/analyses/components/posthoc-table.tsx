import { formatP, formatStat } from "@/lib/format";
import type { PosthocView } from "../posthoc";
import { S } from "./stat-symbol";

const MINUS = "\u2212";

/** The post-hoc comparisons: pair, difference with its interval, adjusted p and effect size. */
export function PosthocTable({
  view,
  methodName,
  alpha,
  unit,
}: {
  view: PosthocView;
  methodName: string;
  alpha: number;
  unit: string;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label="Post-hoc comparisons">
        <caption className="mb-1 text-left text-xs text-ink-soft">
          {methodName}.{" "}
          {view.centreLabel === "shift"
            ? "Shift = the Hodges–Lehmann estimate of how far the first group's values lie above the second's"
            : "Difference = first group minus second"}
          {unit ? `, in ${unit}` : ""}; intervals hold {Math.round((1 - alpha) * 100)}% together.{" "}
          {view.effectNote}
        </caption>
        <thead className="border-b border-ink/15 text-right text-ink-soft">
          <tr>
            <th className="p-1.5 text-left font-medium">Pair</th>
            <th className="p-1.5 font-medium">{view.centreLabel === "shift" ? "Shift" : "Difference"}</th>
            <th className="p-1.5 font-medium">Interval</th>
            <th className="p-1.5 font-medium">
              Adjusted <S>p</S>
            </th>
            <th className="p-1.5 font-medium">
              {view.effectLabel === "r" ? (
                <S>r</S>
              ) : (
                <>
                  Hedges' <S>g</S>
                </>
              )}
            </th>
          </tr>
        </thead>
        <tbody className="num text-right">
          {view.rows.map((r) => {
            const sig = r.pAdj !== null && r.pAdj < alpha;
            return (
              <tr
                key={`${r.a}|${r.b}`}
                className={`border-b border-ink/5 last:border-0 ${sig ? "font-semibold" : ""}`}
              >
                <th scope="row" className="p-1.5 text-left font-sans font-medium">
                  {r.a} {MINUS} {r.b}
                </th>
                <td className="p-1.5">{r.diff !== null ? formatStat(r.diff) : "—"}</td>
                <td className="p-1.5">
                  {r.lower !== null && r.upper !== null
                    ? `[${formatStat(r.lower)}, ${formatStat(r.upper)}]`
                    : "—"}
                </td>
                <td className="p-1.5">{r.pAdj !== null ? formatP(r.pAdj).replace(/^= /, "") : "—"}</td>
                <td className="p-1.5">{r.effect !== null ? formatStat(r.effect) : "—"}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {!view.hasIntervals && (
        <p className="mt-1 text-xs text-ink-soft">
          No pair has an interval here; the report notes the reason for each.
        </p>
      )}
    </div>
  );
}
