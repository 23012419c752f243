import * as Plot from "@observablehq/plot";
import { useMemo } from "react";
import { formatStat } from "@/lib/format";
import type { PairView } from "../posthoc";
import { PlotFigure } from "@/components/ui/plot-figure";

interface Bar {
  label: string;
  diff: number;
  lower: number;
  upper: number;
  clear: boolean;
}

/** Each pair's difference with its simultaneous interval, against the zero line. */
export function IntervalsPlot({
  rows,
  unit,
  level,
  centre = "difference",
}: {
  rows: PairView[];
  unit: string;
  level: number;
  /** What each point is: a difference of means, or a Hodges–Lehmann shift (rank comparisons). */
  centre?: "difference" | "shift";
}) {
  const word = centre === "shift" ? "shift" : "difference";
  const bars = useMemo<Bar[]>(
    () =>
      rows
        .filter((r) => r.diff !== null && r.lower !== null && r.upper !== null)
        .map((r) => ({
          label: `${r.a} \u2212 ${r.b}`,
          diff: r.diff as number,
          lower: r.lower as number,
          upper: r.upper as number,
          clear: (r.lower as number) > 0 || (r.upper as number) < 0,
        })),
    [rows],
  );
  const options = useMemo<Plot.PlotOptions>(
    () => ({
      width: 640,
      height: Math.max(140, 36 * bars.length + 60),
      marginLeft: Math.min(260, 12 + 7 * Math.max(...bars.map((b) => b.label.length), 8)),
      x: {
        label: `${word === "shift" ? "Shift" : "Difference"}${unit ? ` (${unit})` : ""}`,
        grid: true,
        nice: true,
      },
      y: { label: null, domain: bars.map((b) => b.label) },
      marks: [
        Plot.ruleX([0], { stroke: "#A8432F", strokeWidth: 1.5 }),
        Plot.ruleY(bars, {
          y: "label",
          x1: "lower",
          x2: "upper",
          stroke: (d: Bar) => (d.clear ? "#1F4D45" : "#4A5862"),
          strokeWidth: 2.5,
        }),
        Plot.dot(bars, {
          y: "label",
          x: "diff",
          r: 5,
          symbol: (d: Bar) => (d.clear ? "circle" : "diamond"),
          fill: (d: Bar) => (d.clear ? "#1F4D45" : "#FBF9F5"),
          stroke: (d: Bar) => (d.clear ? "#1F4D45" : "#4A5862"),
          strokeWidth: 1.5,
          title: (d: Bar) =>
            `${d.label}: ${formatStat(d.diff)} [${formatStat(d.lower)}, ${formatStat(d.upper)}]`,
        }),
      ],
    }),
    [bars, unit],
  );
  if (bars.length === 0) return null;
  return (
    <PlotFigure
      options={options}
      label={`${word === "shift" ? "Shifts" : "Differences"} between pairs of groups with simultaneous intervals`}
      caption={`Point: the ${word}; bar: its interval (the intervals hold ${Math.round(level * 100)}% together). Filled points with intervals that miss zero are differences the comparisons detect; open diamonds cross zero.`}
    />
  );
}
