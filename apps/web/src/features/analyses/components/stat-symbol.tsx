import type { ReactNode } from "react";

/** An italic statistic symbol (F, p, H, W, ω²…), as reports print them. */
export function S({ children }: { children: ReactNode }) {
  return <i className="italic">{children}</i>;
}
