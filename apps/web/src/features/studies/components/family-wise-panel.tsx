import { formatAlpha, formatPercent } from "@/lib/format";
import { plannedComparisons } from "@/lib/labels";
import type { Comparisons as ComparisonSet } from "@waymark/stats/vocabulary";

/** Why the comparisons need protecting: the chance of at least one false alarm over m tests. */
export function FamilyWisePanel({
  k,
  alpha,
  comparisons,
}: {
  k: number;
  alpha: number;
  comparisons: ComparisonSet;
}) {
  const m = plannedComparisons(k, comparisons);
  const fwer = 1 - (1 - alpha) ** m;
  const rows = [1, Math.max(1, Math.ceil(m / 2)), m, m * 2].filter((x, i, a) => a.indexOf(x) === i && x >= 1);
  return (
    <section aria-labelledby="fwe-title" className="rounded-lg bg-panel p-5">
      <h3 id="fwe-title" className="font-semibold">
        Errors over many comparisons
      </h3>
      <p className="mt-2 max-w-prose">
        The plan makes <strong className="tabular-nums">m = {m}</strong> comparison{m === 1 ? "" : "s"} of {k}{" "}
        groups. If each were tested on its own at α&nbsp;=&nbsp;{formatAlpha(alpha)} and no difference were
        real, the chance of at least one false alarm would be{" "}
        <strong className="tabular-nums" data-testid="fwer">
          {formatPercent(fwer)}
        </strong>{" "}
        rather than {formatPercent(alpha)} (1 − (1 − α)<sup>m</sup>, for independent tests).
      </p>
      <div className="relative max-w-full overflow-x-auto">
        <table className="num mt-3 text-sm">
          <caption className="sr-only">Chance of at least one false alarm by number of comparisons</caption>
          <thead>
            <tr className="text-left text-ink-soft">
              <th className="pr-6 font-medium">comparisons m</th>
              <th className="pr-6 font-medium">per test α</th>
              <th className="font-medium">
                1 − (1 − α)<sup>m</sup>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r} className={r === m ? "font-semibold" : undefined}>
                <td className="pr-6">{r}</td>
                <td className="pr-6">{formatAlpha(alpha)}</td>
                <td>{formatPercent(1 - (1 - alpha) ** r)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-3 max-w-prose text-sm">
        That is why the analysis runs in two stages. The omnibus test first asks one question at α: do the
        group means (or rank distributions) differ at all? The post-hoc comparisons then locate the
        differences, using a method that holds the chance of any false alarm over the whole family at α.
        Fixing both in the plan, before the data are seen, keeps the analysis from choosing the comparisons
        that happen to look largest.
      </p>
    </section>
  );
}
