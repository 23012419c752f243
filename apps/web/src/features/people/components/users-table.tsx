import { useState } from "react";
import { Button } from "@/components/ui/button";
import { columnHelper, DataTable, timeOf } from "@/components/ui/data-table";
import { formatDateTime } from "@/lib/format";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/roles";
import { useUpdateUser } from "../api/update-user";
import type { AccountDto as Account } from "@waymark/contract";

/** "an analyst", "a reviewer". */
const withArticle = (r: Role) => {
  const word = ROLE_LABELS[r].toLowerCase();
  return `${/^[aeiou]/.test(word) ? "an" : "a"} ${word}`;
};

const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

function Problem({ error }: { error: Error | null }) {
  if (!error) return null;
  return (
    <p role="alert" className="mt-1 max-w-xs text-sm text-brick">
      {error.message}
    </p>
  );
}

/**
 * The role drop-down of one account. Picking a role only proposes it: the change applies after
 * the admin confirms it in the row. A refusal (such as the last admin) is shown beneath it.
 */
function RoleCell({ user }: { user: Account }) {
  const update = useUpdateUser(user.id);
  const [proposed, setProposed] = useState<Role | null>(null);
  const shown =
    proposed ??
    (update.isPending && update.variables && "role" in update.variables ? update.variables.role : user.role);
  return (
    <div>
      <label htmlFor={`role-${user.id}`} className="sr-only">
        Role of {user.displayName}
      </label>
      <select
        id={`role-${user.id}`}
        value={shown}
        disabled={update.isPending}
        onChange={(e) => {
          update.reset();
          const role = e.target.value as Role;
          setProposed(role === user.role ? null : role);
        }}
        className="rounded-md border border-ink/25 bg-paper px-2 py-1 text-sm"
      >
        {ROLE_OPTIONS.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {proposed && (
        <div
          className="mt-2 flex max-w-xs flex-col gap-2 rounded-md bg-stone p-2"
          role="group"
          aria-label={`Confirm: change the role of ${user.displayName}`}
        >
          <p className="text-sm">
            {user.displayName} will be {withArticle(proposed)} instead of {withArticle(user.role)}, with that
            role's permissions from their next request.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button
              className="!px-3 !py-1"
              disabled={update.isPending}
              onClick={() => update.mutate({ role: proposed }, { onSettled: () => setProposed(null) })}
            >
              Yes, change the role
            </Button>
            <Button variant="quiet" className="!px-3 !py-1" onClick={() => setProposed(null)}>
              Keep as is
            </Button>
          </div>
        </div>
      )}
      <Problem error={update.error} />
    </div>
  );
}

/** Deactivate or reactivate, with a confirm step in the row. */
function ActiveCell({ user }: { user: Account }) {
  const update = useUpdateUser(user.id);
  const [confirming, setConfirming] = useState(false);
  const next = !user.active;
  const verb = next ? "Reactivate" : "Deactivate";
  return (
    <div>
      {confirming ? (
        <div
          className="flex flex-col gap-2 rounded-md bg-stone p-2"
          role="group"
          aria-label={`Confirm: ${verb.toLowerCase()} ${user.displayName}`}
        >
          <p className="text-sm">
            {next
              ? `${user.displayName} will be able to sign in again.`
              : `${user.displayName} will be signed out and can no longer sign in. Their studies and signatures stay.`}
          </p>
          <div className="flex gap-2">
            <Button
              variant={next ? "primary" : "danger"}
              className="!px-3 !py-1"
              disabled={update.isPending}
              onClick={() => update.mutate({ active: next }, { onSettled: () => setConfirming(false) })}
            >
              {`Yes, ${verb.toLowerCase()}`}
            </Button>
            <Button variant="quiet" className="!px-3 !py-1" onClick={() => setConfirming(false)}>
              Keep as is
            </Button>
          </div>
        </div>
      ) : (
        <Button
          variant={next ? "secondary" : "quiet"}
          className={`!px-3 !py-1 ${next ? "" : "!text-brick"}`}
          onClick={() => {
            update.reset();
            setConfirming(true);
          }}
          aria-label={`${verb} ${user.displayName}`}
        >
          {verb}
        </Button>
      )}
      <Problem error={update.error} />
    </div>
  );
}

const h = columnHelper<Account>();
const columns = h.columns([
  h.accessor("displayName", {
    header: "Name",
    sortFn: "text",
    cell: (c) => <span className="font-medium">{c.row.original.displayName}</span>,
  }),
  h.accessor("email", { header: "E-mail", sortFn: "text" }),
  h.accessor("role", { header: "Role", sortFn: "text", cell: (c) => <RoleCell user={c.row.original} /> }),
  h.accessor((u) => (u.active ? "Active" : "Deactivated"), {
    id: "status",
    header: "Status",
    sortFn: "text",
    cell: (c) =>
      c.row.original.active ? (
        <span className="text-spruce">Active</span>
      ) : (
        <span className="rounded-sm bg-panel px-1.5 py-0.5 text-xs font-semibold text-ink-soft">
          Deactivated
        </span>
      ),
  }),
  h.accessor((u) => timeOf(u.lastSignInAt), {
    id: "lastSignIn",
    header: "Last sign-in",
    cell: (c) =>
      c.row.original.lastSignInAt ? (
        <span className="num">{formatDateTime(c.row.original.lastSignInAt)}</span>
      ) : (
        <span className="text-ink-soft">Never</span>
      ),
  }),
  h.display({
    id: "actions",
    header: () => <span className="sr-only">Actions</span>,
    cell: (c) => <ActiveCell user={c.row.original} />,
  }),
]);

export function UsersTable({ users }: { users: Account[] }) {
  return (
    <DataTable
      label="Accounts"
      testId="users-table"
      columns={columns}
      data={users}
      getRowId={(u) => String(u.id)}
      initialSorting={[{ id: "displayName", desc: false }]}
      rowClassName={(u) => (u.active ? undefined : "text-ink-soft")}
      empty="There are no accounts yet."
    />
  );
}
