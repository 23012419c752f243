import { formatNumber } from "@/lib/format";
import { num } from "@/lib/result-values";
import type { GroupDescription } from "@waymark/stats/result";
import { GroupSwatch } from "./group-swatch";

function cell(x: unknown, digits = 2): string {
  const v = num(x);
  return v === null ? "—" : formatNumber(v, digits);
}

/** Per-group descriptives. A dash marks a value that cannot be computed (e.g. the SD of one value). */
export function DescriptivesTable({ groups, unit }: { groups: GroupDescription[]; unit: string }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="mb-1 text-left text-xs text-ink-soft">
          {unit ? `Values in ${unit}. ` : ""}CI: 95% confidence interval of the mean. — : not computable.
        </caption>
        <thead className="border-b border-ink/15 text-right text-ink-soft">
          <tr>
            <th className="p-1.5 text-left font-medium">Group</th>
            <th className="p-1.5 font-medium">n</th>
            <th className="p-1.5 font-medium">Mean</th>
            <th className="p-1.5 font-medium">SD</th>
            <th className="p-1.5 font-medium">SE</th>
            <th className="p-1.5 font-medium">95% CI</th>
            <th className="p-1.5 font-medium">Median</th>
            <th className="p-1.5 font-medium">Q1 – Q3</th>
            <th className="p-1.5 font-medium">Min – max</th>
          </tr>
        </thead>
        <tbody className="num text-right">
          {groups.map((g, i) => (
            <tr key={g.name} className="border-b border-ink/5 last:border-0">
              <th scope="row" className="p-1.5 text-left font-sans font-medium">
                <span className="inline-flex items-center gap-1.5">
                  <GroupSwatch index={i} />
                  {g.name}
                </span>
              </th>
              <td className="p-1.5">
                {g.n}
                {num(g.missing) ? (
                  <span className="text-xs text-ink-soft"> (+{g.missing} missing)</span>
                ) : null}
              </td>
              <td className="p-1.5">{cell(g.mean)}</td>
              <td className="p-1.5">{cell(g.sd)}</td>
              <td className="p-1.5">{cell(g.se)}</td>
              <td className="p-1.5">
                {num(g.ciLower) !== null && num(g.ciUpper) !== null
                  ? `[${cell(g.ciLower)}, ${cell(g.ciUpper)}]`
                  : "—"}
              </td>
              <td className="p-1.5">{cell(g.median)}</td>
              <td className="p-1.5">
                {num(g.q1) !== null && num(g.q3) !== null ? `${cell(g.q1)} – ${cell(g.q3)}` : "—"}
              </td>
              <td className="p-1.5">{`${cell(g.min)} – ${cell(g.max)}`}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
