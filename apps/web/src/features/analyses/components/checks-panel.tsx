import { isAvailable, reasonOf } from "@/lib/result-values";
import type { ChecksResponse, StudyDto as Study } from "@waymark/contract";
import type { GroupDescription } from "@waymark/stats/result";
import { BoxPointsPlot, type PlottedGroup } from "./box-points-plot";
import { CheckSection } from "./check-section";
import { DescriptivesTable } from "./descriptives-table";
import { GroupSizes } from "./group-sizes";
import { NormalityTable } from "./normality-table";
import { OutliersList } from "./outliers-list";
import { QqPlotFigure } from "./qq-plot-figure";
import { SpreadTable } from "./spread-table";
import { UnavailableNote } from "./unavailable-note";

const KNOWN = new Set(["normality", "spread", "outliers", "sizes"]);

/** Attaches each group's raw values, when the server sends them, for the points of the box plot. */
function withValues(
  groups: GroupDescription[],
  observations: ChecksResponse["observations"],
): PlottedGroup[] {
  const list = observations?.groups;
  if (!Array.isArray(list)) return groups;
  return groups.map((g) => {
    const o = list.find((x) => x.name === g.name);
    const values = o?.values
      ?.map((v) => (typeof v === "number" ? v : Number(v)))
      .filter((v) => Number.isFinite(v));
    return values && values.length > 0 && !("values" in g) ? { ...g, values } : g;
  });
}

/** The assumption checks on one data version, each with its plain reading and what it means. */
export function ChecksPanel({ study, data }: { study: Study; data: ChecksResponse }) {
  const c = data.checks;
  const alpha = c.options?.alpha ?? study.plan.alpha;
  const reading = (key: string) => data.readings.find((r) => r.key === key);
  const other = data.readings.filter((r) => !KNOWN.has(r.key));
  const outcome = `${study.outcomeName}${study.outcomeUnit ? ` (${study.outcomeUnit})` : ""}`;
  const groups = isAvailable(c.groups) ? withValues(c.groups, data.observations) : null;
  return (
    <div className="flex flex-col gap-5">
      {(other.length > 0 || (c.warnings?.length ?? 0) > 0) && (
        <ul className="flex flex-col gap-1 rounded-lg bg-paper p-4 text-sm shadow-sm">
          {other.map((r) => (
            <li key={r.key} className={r.level === "attention" ? "text-amber-800" : undefined}>
              {r.text}
            </li>
          ))}
          {c.warnings?.map((w) => (
            <li key={w} className="text-amber-800">
              {w}
            </li>
          ))}
        </ul>
      )}
      <CheckSection
        id="sizes"
        title="The groups"
        reading={reading("sizes")}
        meaning={
          <>
            <p>
              The table summarises each group; the chart shows where the values lie. Look for groups whose
              spread or shape differs from the others, and for single values far from the rest.
            </p>
            <p>Small groups make every check below less able to spot a problem, so read them with care.</p>
          </>
        }
      >
        {groups ? (
          <div className="flex flex-col gap-4">
            <GroupSizes groups={groups} />
            <DescriptivesTable groups={groups} unit={study.outcomeUnit} />
            <BoxPointsPlot groups={groups} outliers={c.outliers} outcomeLabel={outcome} />
          </div>
        ) : (
          <UnavailableNote what="The group summaries" value={c.groups} />
        )}
      </CheckSection>
      <CheckSection
        id="normality"
        title="Normality of the residuals"
        reading={reading("normality")}
        meaning={
          <>
            <p>
              ANOVA assumes the values scatter around their group mean in a roughly normal way. On the Q–Q
              plot, points close to the dashed line agree with that; a curve or points peeling away at the
              ends suggest skew or heavy tails.
            </p>
            <p>
              The Shapiro–Wilk test puts a number on it. With small groups it misses real departures; with
              large groups it flags harmless ones, and the means are close to normal anyway (central limit
              theorem). Read the plot and the test together.
            </p>
          </>
        }
      >
        <div className="flex flex-wrap items-start gap-6">
          {isAvailable(c.qq) ? (
            <QqPlotFigure qq={c.qq} unit={study.outcomeUnit} />
          ) : (
            <p className="text-sm text-ink-soft">Q–Q plot: {reasonOf(c.qq)}</p>
          )}
          <NormalityTable perGroup={c.shapiroWilk} residuals={c.shapiroWilkResiduals} alpha={alpha} />
        </div>
      </CheckSection>
      <CheckSection
        id="spread"
        title="Equal spread"
        reading={reading("spread")}
        meaning={
          <>
            <p>
              Classic ANOVA pools the groups' variances, so it assumes they are about equal. When they differ,
              especially with unequal group sizes, its p-value can be misleading; Welch's ANOVA does not need
              the assumption.
            </p>
            <p>
              Brown–Forsythe compares the spread around each group's median and copes with skewed data; Levene
              uses the mean; Bartlett is sharper for normal data but easily upset by non-normality. A
              largest-to-smallest SD ratio above about 2 is the usual rule of thumb for trouble.
            </p>
          </>
        }
      >
        <SpreadTable
          brownForsythe={c.brownForsythe}
          levene={c.levene}
          bartlett={c.bartlett}
          sdRatio={c.sdRatio}
          alpha={alpha}
        />
      </CheckSection>
      <CheckSection
        id="outliers"
        title="Unusual values"
        reading={reading("outliers")}
        meaning={
          <>
            <p>
              A value beyond 1.5 times the interquartile range from its group's quartiles is unusual; beyond 3
              times, extreme. A studentized residual beyond ±3 means a value lies far from its group mean
              given the common spread.
            </p>
            <p>
              Check flagged rows against the source records. Do not delete a value only because it is unusual;
              a rank-based test is less affected by it.
            </p>
          </>
        }
      >
        <OutliersList outliers={c.outliers} />
      </CheckSection>
    </div>
  );
}
