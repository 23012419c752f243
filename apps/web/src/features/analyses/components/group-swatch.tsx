import { groupColour, groupSymbol } from "./group-marks";

/** The small mark beside a group's name in tables: the same colour and shape as in the charts. */
export function GroupSwatch({ index }: { index: number }) {
  const colour = groupColour(index);
  const shape = groupSymbol(index);
  return (
    <svg viewBox="-6 -6 12 12" className="inline-block h-3 w-3 shrink-0" aria-hidden="true">
      {shape === "square" ? (
        <rect x="-4.5" y="-4.5" width="9" height="9" fill={colour} />
      ) : shape === "triangle" ? (
        <path d="M0 -5 L5 4 L-5 4 Z" fill={colour} />
      ) : shape === "diamond" ? (
        <path d="M0 -5.5 L5.5 0 L0 5.5 L-5.5 0 Z" fill={colour} />
      ) : shape === "circle" ? (
        <circle r="5" fill={colour} />
      ) : (
        <path d="M-4.5 -4.5 L4.5 4.5 M4.5 -4.5 L-4.5 4.5" stroke={colour} strokeWidth="2.2" />
      )}
    </svg>
  );
}
