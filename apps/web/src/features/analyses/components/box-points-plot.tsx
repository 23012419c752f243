import * as Plot from "@observablehq/plot";
import { useMemo } from "react";
import { formatValue } from "@/lib/format";
import { isAvailable, num, type Maybe } from "@/lib/result-values";
import type { GroupDescription, OutlierReport as OutlierPart } from "@waymark/stats/result";

/** A group's description with its values, when the server sends them (for the points). */
export type PlottedGroup = GroupDescription & { values?: number[] };
import { groupColour, groupSymbol } from "./group-marks";
import { PlotFigure } from "@/components/ui/plot-figure";

/** Groups up to this size show every value as a point; larger ones show only flagged values. */
export const ALL_POINTS_UP_TO = 60;

interface Box {
  i: number;
  name: string;
  q1: number;
  median: number;
  q3: number;
  low: number;
  high: number;
}
interface Point {
  i: number;
  name: string;
  x: number;
  value: number;
  flagged: boolean;
  row?: number;
}

/** Deterministic jitter in [−0.18, 0.18]: the same picture every time (golden-ratio sequence). */
function jitter(j: number): number {
  return (((j * 0.6180339887) % 1) - 0.5) * 0.36;
}

/**
 * Box and points per group: the box spans the quartiles with the median across it, the whiskers
 * reach the most extreme values within 1.5 IQR (or min and max when the values are not sent),
 * and each value is a jittered point for small groups. Colour, shape and the axis label tell the
 * groups apart.
 */
export function BoxPointsPlot({
  groups,
  outliers,
  outcomeLabel,
}: {
  groups: PlottedGroup[];
  outliers?: Maybe<OutlierPart>;
  outcomeLabel: string;
}) {
  const { boxes, points, showsAll } = useMemo(() => {
    const flagged = new Map<string, { value: number; row: number }[]>();
    if (isAvailable(outliers))
      for (const g of outliers.groups ?? [])
        flagged.set(
          g.group,
          [...(g.mild ?? []), ...(g.extreme ?? [])].filter((f) => num(f.value) !== null),
        );
    const boxes: Box[] = [];
    const points: Point[] = [];
    let showsAll = true;
    groups.forEach((g, i) => {
      const q1 = num(g.q1) ?? num(g.median);
      const q3 = num(g.q3) ?? num(g.median);
      const median = num(g.median);
      if (q1 === null || q3 === null || median === null) return;
      const values = Array.isArray(g.values) ? g.values.filter((v): v is number => num(v) !== null) : null;
      const iqr = q3 - q1;
      const inside = values?.filter((v) => v >= q1 - 1.5 * iqr && v <= q3 + 1.5 * iqr);
      const low = inside && inside.length ? Math.min(...inside) : (num(g.min) ?? q1);
      const high = inside && inside.length ? Math.max(...inside) : (num(g.max) ?? q3);
      boxes.push({ i, name: g.name, q1, median, q3, low, high });
      const marks = flagged.get(g.name) ?? [];
      const flaggedValues = new Set(marks.map((m) => m.value));
      if (values && values.length <= ALL_POINTS_UP_TO) {
        values.forEach((v, j) =>
          points.push({ i, name: g.name, x: i + jitter(j + 1), value: v, flagged: flaggedValues.has(v) }),
        );
      } else {
        showsAll = false;
        marks.forEach((m, j) =>
          points.push({ i, name: g.name, x: i + jitter(j + 1), value: m.value, flagged: true, row: m.row }),
        );
      }
    });
    return { boxes, points, showsAll };
  }, [groups, outliers]);

  const names = boxes.map((b) => b.name);
  const options = useMemo<Plot.PlotOptions>(
    () => ({
      width: Math.max(360, Math.min(760, 150 * names.length + 80)),
      height: 320,
      marginLeft: 56,
      marginBottom: 44,
      x: {
        domain: [-0.6, names.length - 0.4],
        ticks: names.map((_, i) => i),
        tickFormat: (i: number) => names[i] ?? "",
        label: null,
        tickSize: 0,
      },
      y: { label: outcomeLabel, grid: true, nice: true },
      marks: [
        Plot.ruleX(boxes, { x: "i", y1: "low", y2: "high", stroke: "#1E2A32", strokeOpacity: 0.6 }),
        Plot.rect(boxes, {
          x1: (d: Box) => d.i - 0.26,
          x2: (d: Box) => d.i + 0.26,
          y1: "q1",
          y2: "q3",
          fill: (d: Box) => groupColour(d.i),
          fillOpacity: 0.16,
          stroke: (d: Box) => groupColour(d.i),
        }),
        Plot.ruleY(boxes, {
          y: "median",
          x1: (d: Box) => d.i - 0.26,
          x2: (d: Box) => d.i + 0.26,
          stroke: "#1E2A32",
          strokeWidth: 2.5,
        }),
        Plot.dot(points, {
          x: "x",
          y: "value",
          r: (d: Point) => (d.flagged ? 5 : 3.5),
          symbol: (d: Point) => groupSymbol(d.i),
          fill: (d: Point) => groupColour(d.i),
          stroke: (d: Point) => (d.flagged ? "#D9961A" : "#FBF9F5"),
          strokeWidth: (d: Point) => (d.flagged ? 2 : 0.8),
          title: (d: Point) =>
            `${d.name}: ${formatValue(d.value)}${d.row ? ` (row ${d.row})` : ""}${d.flagged ? ", flagged as an outlier" : ""}`,
        }),
      ],
    }),
    [boxes, points, names, outcomeLabel],
  );
  if (boxes.length === 0)
    return <p className="text-sm text-ink-soft">The box plot needs quartiles for at least one group.</p>;
  return (
    <PlotFigure
      options={options}
      label={`Box and points plot of ${outcomeLabel} by group`}
      caption={
        showsAll
          ? "Box: quartiles with the median; whiskers: values within 1.5 IQR; points: every value, spread sideways so they do not overlap. Amber rings mark flagged outliers."
          : `Box: quartiles with the median; whiskers: ${groups.some((g) => Array.isArray(g.values)) ? "values within 1.5 IQR" : "minimum to maximum"}; points: values flagged as outliers only.`
      }
    />
  );
}
