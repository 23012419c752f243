import * as Plot from "@observablehq/plot";
import { useEffect, useRef } from "react";

/**
 * Renders an Observable Plot chart (SVG) into the page. `options` should be memoised by the
 * caller; the chart is redrawn when it changes. The caption says in words what the chart shows.
 */
export function PlotFigure({
  options,
  label,
  caption,
}: {
  options: Plot.PlotOptions;
  label: string;
  caption?: string;
}) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const node = ref.current;
    if (!node) return;
    let chart: (SVGSVGElement | HTMLElement) | null = null;
    try {
      chart = Plot.plot({
        style: { fontFamily: "var(--font-sans)", fontSize: "12px", background: "transparent" },
        ...options,
      });
      // The wrapper is the accessible image (role="img" with a label); Plot's own aria-labels on
      // inner groups are not allowed on elements without a role, and say nothing a reader needs.
      for (const el of chart.querySelectorAll("[aria-label]")) el.removeAttribute("aria-label");
      chart.setAttribute("aria-hidden", "true");
      node.replaceChildren(chart);
    } catch {
      node.replaceChildren(document.createTextNode("This chart could not be drawn."));
    }
    return () => chart?.remove();
  }, [options]);
  return (
    <figure className="overflow-x-auto">
      <div ref={ref} role="img" aria-label={label} />
      {caption && <figcaption className="mt-1 text-xs text-ink-soft">{caption}</figcaption>}
    </figure>
  );
}
