import { ErrorPanel } from "@/components/errors/error-panel";
import { useInvitations } from "../api/get-invitations";
import { useUsers } from "../api/get-users";
import { InvitationsTable } from "./invitations-table";
import { InviteForm } from "./invite-form";
import { UsersTable } from "./users-table";

/** Accounts, the invite form and the invitations sent, for admins. */
export function PeoplePage() {
  const users = useUsers();
  const invitations = useInvitations();
  return (
    <div className="flex flex-col gap-8">
      <header>
        <h1 className="text-3xl font-semibold text-spruce">People</h1>
        <p className="mt-1 max-w-prose text-ink-soft">
          Who can sign in, and in which role. A role change or deactivation signs the person out, so they
          never keep rights they no longer have.
        </p>
      </header>
      <section aria-labelledby="accounts-title" className="flex flex-col gap-3">
        <h2 id="accounts-title" className="text-xl font-semibold">
          Accounts
        </h2>
        {users.isPending && <p className="text-ink-soft">Loading the accounts…</p>}
        {users.error && <ErrorPanel title="The accounts could not be loaded" message={users.error.message} />}
        {users.data && <UsersTable users={users.data} />}
      </section>
      <section aria-labelledby="invite-title" className="flex flex-col gap-3">
        <h2 id="invite-title" className="text-xl font-semibold">
          Invite a person
        </h2>
        <div className="rounded-lg bg-paper p-4 shadow-sm">
          <InviteForm />
        </div>
      </section>
      <section aria-labelledby="invitations-title" className="flex flex-col gap-3">
        <h2 id="invitations-title" className="text-xl font-semibold">
          Invitations
        </h2>
        {invitations.isPending && <p className="text-ink-soft">Loading the invitations…</p>}
        {invitations.error && (
          <ErrorPanel title="The invitations could not be loaded" message={invitations.error.message} />
        )}
        {invitations.data && <InvitationsTable invitations={invitations.data} />}
      </section>
    </div>
  );
}
