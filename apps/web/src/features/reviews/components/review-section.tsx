import type { ReactNode } from "react";
import { AttentionMarker } from "@/components/ui/attention-marker";

/** One step of the study's trail on the review page, read-only, with its marker in the heading. */
export function ReviewSection({
  id,
  number,
  title,
  flag,
  children,
}: {
  id: string;
  number: number;
  title: string;
  flag?: string;
  children: ReactNode;
}) {
  return (
    <section
      id={id}
      aria-labelledby={`${id}-title`}
      className="scroll-mt-4 rounded-lg bg-paper p-5 shadow-sm"
    >
      <h2 id={`${id}-title`} className="flex flex-wrap items-center gap-2 text-lg font-semibold">
        <span
          className="num inline-grid h-6 w-6 place-items-center rounded-full bg-spruce text-xs text-stone"
          aria-hidden="true"
        >
          {number}
        </span>
        {title}
        {flag && <AttentionMarker>{flag}</AttentionMarker>}
      </h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}

/** The steps of the trail as a list of jump links, with the same markers as the sections. */
export function ReviewStepIndex({ steps }: { steps: { id: string; title: string; flag?: string }[] }) {
  return (
    <nav aria-label="Steps of the study" className="rounded-lg bg-panel p-2">
      <ol className="flex flex-col gap-0.5">
        {steps.map((s, i) => (
          <li key={s.id}>
            <a
              href={`#${s.id}`}
              className="flex items-center gap-2 rounded px-2 py-1.5 text-sm text-ink no-underline hover:bg-stone hover:no-underline"
            >
              <span
                className="num inline-grid h-5 w-5 shrink-0 place-items-center rounded-full bg-spruce text-[0.65rem] text-stone"
                aria-hidden="true"
              >
                {i + 1}
              </span>
              <span className="flex-1">{s.title}</span>
              {s.flag && <AttentionMarker>{s.flag}</AttentionMarker>}
            </a>
          </li>
        ))}
      </ol>
    </nav>
  );
}
