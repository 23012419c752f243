import { printable } from "../../text/printable.js";
import path from "node:path";
import { fileURLToPath } from "node:url";

/**
 * jsdom, Plot and resvg took about 3 s of the API's start-up while only reports draw figures, so
 * they load on the first figure and stay loaded.
 */
type Libraries = {
  Plot: typeof import("@observablehq/plot");
  Resvg: typeof import("@resvg/resvg-js").Resvg;
  JSDOM: typeof import("jsdom").JSDOM;
};
let libraries: Promise<Libraries> | undefined;
const load = (): Promise<Libraries> =>
  (libraries ??= Promise.all([import("@observablehq/plot"), import("@resvg/resvg-js"), import("jsdom")]).then(
    ([Plot, resvg, jsdom]) => ({ Plot, Resvg: resvg.Resvg, JSDOM: jsdom.JSDOM }),
  ));

const FONT_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../../../../fonts");
const FONT_FILES = ["IBMPlexSans-Regular.ttf", "IBMPlexSans-SemiBold.ttf"].map((f) => path.join(FONT_DIR, f));

/** Okabe & Ito (2008) colour-blind-safe palette; groups are also labelled on the axis, never told apart by colour alone. */
const GROUP_COLOURS = [
  "#0072B2",
  "#E69F00",
  "#009E73",
  "#CC79A7",
  "#56B4E9",
  "#D55E00",
  "#F0E442",
  "#000000",
];

const STYLE = { fontFamily: "IBM Plex Sans", fontSize: "13px", background: "#ffffff", color: "#1E2A32" };

async function render(
  make: (Plot: Libraries["Plot"], document: Document) => SVGSVGElement | HTMLElement,
  width: number,
): Promise<Buffer> {
  const { Plot, Resvg, JSDOM } = await load();
  const { window } = new JSDOM("<!doctype html><html><body></body></html>");
  const node = make(Plot, window.document);
  const svg = node.tagName.toLowerCase() === "svg" ? node : node.querySelector("svg");
  if (!svg) throw new Error("the chart produced no SVG");
  svg.setAttribute("xmlns", "http://www.w3.org/2000/svg");
  const resvg = new Resvg(svg.outerHTML, {
    fitTo: { mode: "width", value: width * 2 },
    background: "#ffffff",
    font: { fontFiles: FONT_FILES, loadSystemFonts: false, defaultFontFamily: "IBM Plex Sans" },
  });
  return Buffer.from(resvg.render().asPng());
}

/** Box of quartiles and median per group with every value drawn over it. */
export async function groupsFigure(
  groups: { name: string; values: number[] }[],
  yLabel: string,
): Promise<Buffer> {
  // The chart renderer refuses control characters: names and labels go through the one sanitizer.
  groups = groups.map((g) => ({ ...g, name: printable(g.name, { singleLine: true }) }));
  yLabel = printable(yLabel, { singleLine: true });
  const data = groups.flatMap((g, gi) =>
    g.values.map((v) => ({ group: g.name, value: v, colour: GROUP_COLOURS[gi % GROUP_COLOURS.length]! })),
  );
  const width = Math.max(480, 150 * groups.length);
  return render(
    (Plot, document) =>
      Plot.plot({
        document,
        width,
        height: 360,
        marginLeft: 60,
        style: STYLE,
        fx: { label: null, domain: groups.map((g) => g.name), padding: 0.15 },
        y: { label: yLabel, grid: true, nice: true },
        marks: [
          Plot.boxY(data, { fx: "group", y: "value", fill: "#E4DED3", stroke: "#1E2A32", r: 0 }),
          Plot.dot(
            data,
            Plot.dodgeX("middle", {
              fx: "group",
              y: "value",
              fill: "colour",
              r: 3,
              stroke: "#ffffff",
              strokeWidth: 0.6,
            }),
          ),
        ],
      }) as unknown as SVGSVGElement,
    width,
  );
}

/** Each pairwise difference with its simultaneous confidence interval, against a zero line. */
export async function intervalsFigure(
  pairs: { label: string; diff: number; lower: number; upper: number }[],
  xLabel: string,
): Promise<Buffer> {
  pairs = pairs.map((p) => ({ ...p, label: printable(p.label, { singleLine: true }) }));
  xLabel = printable(xLabel, { singleLine: true });
  // Room for the longest pair label at 13 px (about 7 px a character), and for the x label below the ticks.
  const marginLeft = Math.min(360, 24 + 7 * Math.max(...pairs.map((p) => p.label.length)));
  const width = marginLeft + 480;
  return render(
    (Plot, document) =>
      Plot.plot({
        document,
        width,
        height: Math.max(170, 40 * pairs.length + 90),
        marginLeft,
        marginRight: 30,
        marginBottom: 50,
        style: STYLE,
        x: {
          label: xLabel,
          labelAnchor: "center",
          labelOffset: 40,
          grid: true,
          nice: true,
          domain: [Math.min(0, ...pairs.map((p) => p.lower)), Math.max(0, ...pairs.map((p) => p.upper))],
        },
        y: { label: null, domain: pairs.map((p) => p.label) },
        marks: [
          Plot.ruleX([0], { stroke: "#A8432F", strokeDasharray: "4,3" }),
          Plot.ruleY(pairs, { y: "label", x1: "lower", x2: "upper", stroke: "#1F4D45", strokeWidth: 2 }),
          Plot.dot(pairs, { y: "label", x: "diff", fill: "#1F4D45", r: 4, symbol: "diamond" }),
        ],
      }) as unknown as SVGSVGElement,
    width,
  );
}
