import { Link } from "react-router-dom";
import { WaymarkLogo } from "@/components/ui/waymark-logo";
import { paths } from "@/config/paths";
import { Mailbox } from "@/features/mailbox/components/mailbox";

/** Public in demo and development mode: the e-mail Waymark sent, caught before it left. */
export function DevMailboxRoute() {
  return (
    <div className="min-h-screen">
      <header className="border-b-4 border-amber bg-spruce text-stone">
        <div className="mx-auto flex max-w-6xl items-center gap-3 px-4 py-3">
          <Link
            to={paths.home}
            className="flex items-center gap-2 text-stone no-underline hover:no-underline"
          >
            <WaymarkLogo />
            <span className="text-lg font-semibold tracking-wide">Waymark</span>
          </Link>
          <span className="rounded-sm bg-amber px-2 py-0.5 text-xs font-semibold text-ink">Demo mailbox</span>
          <Link to={paths.home} className="ml-auto text-sm text-stone">
            Back to Waymark
          </Link>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-4 py-8">
        <h1 className="text-3xl font-semibold text-spruce">Mailbox</h1>
        <p className="mb-5 mt-1 max-w-prose text-ink-soft">
          In demo mode no e-mail leaves this computer: invitations, review requests and decisions land here
          instead. The list refreshes by itself.
        </p>
        <Mailbox />
      </main>
    </div>
  );
}
