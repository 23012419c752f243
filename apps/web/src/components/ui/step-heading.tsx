import type { ReactNode } from "react";

/** The heading of one step on the study page, with a one-line intro. */
export function StepHeading({
  title,
  intro,
  aside,
}: {
  title: string;
  intro?: ReactNode;
  aside?: ReactNode;
}) {
  return (
    <header className="mb-5 flex flex-wrap items-start justify-between gap-3">
      <div>
        <h2 className="text-2xl font-semibold text-spruce">{title}</h2>
        {intro && <p className="mt-1 max-w-prose text-ink-soft">{intro}</p>}
      </div>
      {aside}
    </header>
  );
}
