/**
 * Colours and shapes that tell groups apart in charts. The colours are a colour-blind-safe set
 * (Okabe & Ito 2008, "Color Universal Design"), ordered for contrast on the paper background;
 * every group also gets its own symbol and its name on the axis, so colour is never the only cue.
 */
export const GROUP_COLOURS = [
  "#0072B2",
  "#D55E00",
  "#009E73",
  "#CC79A7",
  "#E69F00",
  "#56B4E9",
  "#1E2A32",
  "#8C6D1F",
];
export const GROUP_SYMBOLS = [
  "circle",
  "square",
  "triangle",
  "diamond",
  "cross",
  "star",
  "wye",
  "times",
] as const;

export function groupColour(index: number): string {
  return GROUP_COLOURS[index % GROUP_COLOURS.length] ?? "#1E2A32";
}

export function groupSymbol(index: number): (typeof GROUP_SYMBOLS)[number] {
  return GROUP_SYMBOLS[index % GROUP_SYMBOLS.length] ?? "circle";
}
