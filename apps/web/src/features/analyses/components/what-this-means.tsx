import type { ReactNode } from "react";

/** A short explanation a reader opens when they want it. */
export function WhatThisMeans({
  children,
  title = "What this means",
}: {
  children: ReactNode;
  title?: string;
}) {
  return (
    <details className="group mt-2 text-sm">
      <summary className="cursor-pointer select-none text-lake hover:underline">{title}</summary>
      <div className="mt-2 max-w-prose space-y-2 border-l-2 border-lake/40 pl-3 text-ink">{children}</div>
    </details>
  );
}
