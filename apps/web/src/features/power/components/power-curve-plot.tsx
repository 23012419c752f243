import * as Plot from "@observablehq/plot";
import { useMemo } from "react";
import { PlotFigure } from "@/components/ui/plot-figure";

/** Power of the omnibus test against n per group, with the chosen n marked. */
export function PowerCurvePlot({
  curve,
  marked,
  target,
}: {
  curve: { n: number; power: number }[];
  marked?: { n: number; power: number };
  target?: number;
}) {
  const points = useMemo(
    () => curve.filter((c) => Number.isFinite(c.n) && Number.isFinite(c.power)),
    [curve],
  );
  const options = useMemo<Plot.PlotOptions>(
    () => ({
      width: 560,
      height: 260,
      marginLeft: 48,
      x: { label: "n per group", grid: true },
      y: { label: "Power", domain: [0, 1], grid: true, tickFormat: (d: number) => `${Math.round(d * 100)}%` },
      marks: [
        ...(target ? [Plot.ruleY([target], { stroke: "#D9961A", strokeDasharray: "4 3" })] : []),
        Plot.line(points, { x: "n", y: "power", stroke: "#1F4D45", strokeWidth: 2 }),
        ...(marked
          ? [
              Plot.dot([marked], { x: "n", y: "power", r: 5, fill: "#1F4D45", stroke: "#FBF9F5" }),
              Plot.text([marked], {
                x: "n",
                y: "power",
                text: (d: { n: number }) => `n = ${d.n}`,
                dx: 10,
                textAnchor: "start",
                fill: "#1E2A32",
              }),
            ]
          : []),
      ],
    }),
    [points, marked, target],
  );
  if (points.length < 2) return null;
  return (
    <PlotFigure
      options={options}
      label="Power curve: power of the omnibus test by n per group"
      caption={target ? "Dashed line: the target power." : undefined}
    />
  );
}
