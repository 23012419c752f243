import type { ReactNode } from "react";
import type { Reading as CheckReading } from "@waymark/stats/result";
import { WhatThisMeans } from "./what-this-means";

/** One assumption check: its plain reading first, then the numbers, then what it means. */
export function CheckSection({
  id,
  title,
  reading,
  meaning,
  children,
}: {
  id: string;
  title: string;
  reading?: CheckReading;
  meaning: ReactNode;
  children: ReactNode;
}) {
  const attention = reading?.level === "attention";
  return (
    <section
      aria-labelledby={`${id}-title`}
      className={`rounded-lg bg-paper p-5 shadow-sm ${attention ? "border-l-4 border-amber" : "border-l-4 border-spruce/40"}`}
      data-testid={`check-${id}`}
    >
      <h3 id={`${id}-title`} className="font-semibold">
        {title}
        {attention && (
          <span className="ml-2 rounded-sm bg-amber-100 px-1.5 py-0.5 text-xs font-semibold text-amber-800 ring-1 ring-amber/60">
            needs a look
          </span>
        )}
      </h3>
      {reading && <p className="mt-1 max-w-prose">{reading.text}</p>}
      <div className="mt-3">{children}</div>
      <WhatThisMeans>{meaning}</WhatThisMeans>
    </section>
  );
}
