import { Check, Circle, Lock } from "lucide-react";
import { NavLink } from "react-router-dom";
import { studyPath } from "@/config/paths";
import type { StepState, StepStatus } from "../step-status";

const STATE_WORD: Record<StepState, string> = { done: "Done", open: "Open", locked: "Locked" };

function Marker({ state, attention }: { state: StepState; attention?: boolean }) {
  const base = "relative z-10 flex h-7 w-7 shrink-0 items-center justify-center rounded-full";
  if (state === "done")
    return (
      <span className={`${base} ${attention ? "bg-amber text-ink" : "bg-spruce text-stone"}`}>
        <Check aria-hidden="true" className="h-4 w-4" strokeWidth={3} />
      </span>
    );
  if (state === "open")
    return (
      <span
        className={`${base} bg-paper ring-2 ${attention ? "text-amber-800 ring-amber" : "text-spruce ring-spruce"}`}
      >
        <Circle aria-hidden="true" className="h-2.5 w-2.5 fill-current" />
      </span>
    );
  return (
    <span className={`${base} bg-panel text-ink-soft ring-1 ring-ink/20`}>
      <Lock aria-hidden="true" className="h-3.5 w-3.5" />
    </span>
  );
}

/** The study's steps down the left side: each one done, open or locked, with its one fact. */
export function StudyTrail({ studyId, steps }: { studyId: number; steps: StepStatus[] }) {
  return (
    <nav aria-label="Study steps">
      <ol className="flex flex-col">
        {steps.map((s, i) => {
          const content = (
            <>
              {i < steps.length - 1 && (
                <span
                  aria-hidden="true"
                  className="absolute left-[13px] top-8 h-[calc(100%-1.25rem)] w-0.5 bg-ink/15"
                />
              )}
              <Marker state={s.state} attention={s.attention} />
              <span className="min-w-0">
                <span className="block text-sm font-semibold">
                  {s.label}
                  {s.next && (
                    <span className="ml-1.5 rounded-sm bg-amber-100 px-1 py-px text-[0.7rem] font-semibold text-amber-800">
                      next
                    </span>
                  )}
                </span>
                <span className="block text-xs text-ink-soft">
                  <span className={s.attention ? "font-semibold text-amber-800" : "font-medium"}>
                    {STATE_WORD[s.state]}
                  </span>{" "}
                  · {s.fact}
                </span>
              </span>
            </>
          );
          return (
            <li
              key={s.key}
              className="relative"
              data-testid={`trail-${s.key}`}
              data-state={s.state}
              data-next={s.next ? "true" : undefined}
            >
              {s.state === "locked" ? (
                <div className="relative flex gap-3 rounded-md p-2 text-ink-soft" aria-disabled="true">
                  {content}
                </div>
              ) : (
                <NavLink
                  to={studyPath(studyId, s.key)}
                  className={({ isActive }) =>
                    `relative flex gap-3 rounded-md p-2 text-ink no-underline hover:bg-paper hover:no-underline ${isActive ? "bg-paper shadow-sm ring-1 ring-spruce/30 [&_.block:first-child]:text-spruce" : ""}`
                  }
                >
                  {content}
                </NavLink>
              )}
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
