import type { User } from "@/lib/current-user";
import { ROLE_LABELS } from "@/lib/roles";
import type { StudyDto as Study } from "@waymark/contract";
import { ROLE_GUIDES, TRAIL } from "../role-guides";
import { WaitingForYou } from "./waiting-for-you";

export function RoleHome({ user, studies }: { user: User; studies?: Study[] }) {
  const guide = ROLE_GUIDES[user.role];
  const firstName = user.displayName.split(" ")[0];
  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_20rem]">
      <section aria-labelledby="home-title">
        <p className="text-sm font-medium uppercase tracking-wider text-ink-soft">
          {ROLE_LABELS[user.role]} · welcome, {firstName}
        </p>
        <h1 id="home-title" className="mt-1 text-3xl font-semibold text-spruce">
          {guide.title}
        </h1>
        {studies && <WaitingForYou user={user} studies={studies} />}
        <p className="mt-4 max-w-2xl text-lg leading-relaxed">{guide.summary}</p>
        <ul className="mt-6 flex max-w-2xl flex-col gap-3">
          {guide.duties.map((d) => (
            <li key={d} className="flex gap-3 rounded-md bg-paper p-3 shadow-sm">
              <span aria-hidden="true" className="mt-1.5 h-2 w-4 shrink-0 rounded-sm bg-amber" />
              <span>{d}</span>
            </li>
          ))}
        </ul>
      </section>
      <aside aria-labelledby="trail-title" className="rounded-lg bg-panel p-5">
        <h2 id="trail-title" className="text-sm font-semibold uppercase tracking-wider text-ink-soft">
          The trail of a study
        </h2>
        <ol className="mt-4 flex flex-col">
          {TRAIL.map((t, i) => {
            const mine = t.owner === user.role;
            return (
              <li key={t.step} className="relative flex gap-3 pb-4 last:pb-0">
                {i < TRAIL.length - 1 && (
                  <span aria-hidden="true" className="absolute left-[11px] top-6 h-full w-0.5 bg-ink/15" />
                )}
                <span
                  aria-hidden="true"
                  className={`relative z-10 mt-0.5 flex h-6 w-6 shrink-0 items-center justify-center rounded-full text-xs font-semibold ${mine ? "bg-spruce text-stone" : "bg-paper text-ink-soft ring-1 ring-ink/20"}`}
                >
                  {i + 1}
                </span>
                <div>
                  <p className={`text-sm ${mine ? "font-semibold text-spruce" : "font-medium"}`}>
                    {t.step}
                    {mine && <span className="sr-only"> (your step)</span>}
                  </p>
                  <p className="text-xs text-ink-soft">{t.what}</p>
                </div>
              </li>
            );
          })}
        </ol>
      </aside>
    </div>
  );
}
