import { ROLE_LABELS } from "@/lib/roles";
import type { PublicConfig } from "../api/get-public-config";

/** Demo mode only: the four accounts and their shared password, one click to fill the form. */
export function DemoAccounts({ config, onPick }: { config: PublicConfig; onPick: (email: string) => void }) {
  if (!config.demo || !config.demoAccounts) return null;
  return (
    <section
      aria-labelledby="demo-heading"
      className="rounded-md border border-amber/50 bg-amber-100 p-4 text-sm"
    >
      <h2 id="demo-heading" className="font-semibold text-amber-800">
        Demo mode
      </h2>
      <p className="mt-1">
        Every demo account uses the password{" "}
        <code className="num rounded bg-paper px-1">{config.demoPassword}</code>. Pick one to fill in its
        e-mail:
      </p>
      <ul className="mt-2 grid grid-cols-2 gap-2">
        {config.demoAccounts.map((a) => (
          <li key={a.email}>
            <button
              type="button"
              onClick={() => onPick(a.email)}
              className="w-full rounded border border-ink/20 bg-paper px-2 py-1 text-left hover:border-spruce"
            >
              <span className="block font-medium">{ROLE_LABELS[a.role]}</span>
              <span className="block truncate text-xs text-ink-soft">{a.email}</span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
