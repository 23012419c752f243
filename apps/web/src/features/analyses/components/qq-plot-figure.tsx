import * as Plot from "@observablehq/plot";
import { useMemo } from "react";
import type { QqPlot as QqPart } from "@waymark/stats/result";
import { PlotFigure } from "@/components/ui/plot-figure";

function quantile(sorted: number[], q: number): number {
  const pos = (sorted.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.ceil(pos);
  return (sorted[lo] ?? 0) + ((sorted[hi] ?? 0) - (sorted[lo] ?? 0)) * (pos - lo);
}

/** Normal Q–Q plot of the residuals, with the reference line through the quartiles. */
export function QqPlotFigure({ qq, unit }: { qq: QqPart; unit: string }) {
  const points = useMemo(() => {
    const ys = qq.residuals;
    return qq.theoretical
      .map((x, i) => ({ x, y: ys[i] as number }))
      .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  }, [qq]);
  const options = useMemo<Plot.PlotOptions>(() => {
    const xs = points.map((p) => p.x).sort((a, b) => a - b);
    const ys = points.map((p) => p.y).sort((a, b) => a - b);
    const x1 = quantile(xs, 0.25);
    const x3 = quantile(xs, 0.75);
    const y1 = quantile(ys, 0.25);
    const y3 = quantile(ys, 0.75);
    const slope = x3 - x1 !== 0 ? (y3 - y1) / (x3 - x1) : 1;
    const lo = xs[0] ?? -2;
    const hi = xs[xs.length - 1] ?? 2;
    const line = [lo, hi].map((x) => ({ x, y: y1 + slope * (x - x1) }));
    return {
      width: 420,
      height: 320,
      marginLeft: 56,
      x: { label: "Normal quantile", grid: true },
      y: { label: `Residual${unit ? ` (${unit})` : ""}`, grid: true },
      marks: [
        Plot.line(line, { x: "x", y: "y", stroke: "#2F6E91", strokeDasharray: "5 3" }),
        Plot.dot(points, { x: "x", y: "y", r: 3, fill: "#1F4D45", fillOpacity: 0.8 }),
      ],
    };
  }, [points, unit]);
  if (points.length < 2) return <p className="text-sm text-ink-soft">Too few residuals for a Q–Q plot.</p>;
  return (
    <PlotFigure
      options={options}
      label="Normal Q–Q plot of the residuals"
      caption={`Each point is a residual (value minus its group's mean) against where it would fall if the residuals were normal. Dashed: the line through the quartiles.${qq.thinned ? " Evenly spaced residuals are shown." : ""}`}
    />
  );
}
