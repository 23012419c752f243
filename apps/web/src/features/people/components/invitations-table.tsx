import { columnHelper, DataTable, timeOf } from "@/components/ui/data-table";
import { formatDateTime } from "@/lib/format";
import { ROLE_LABELS } from "@/lib/roles";
import type { InvitationDto as Invitation, InvitationState } from "@waymark/contract";

const STATE: Record<InvitationState, { label: string; className: string }> = {
  open: { label: "Open, not yet used", className: "bg-spruce-100 text-spruce" },
  used: { label: "Used", className: "bg-panel text-ink" },
  expired: { label: "Expired", className: "bg-brick-100 text-brick" },
  revoked: { label: "Replaced by a newer one", className: "bg-panel text-ink-soft" },
};

const h = columnHelper<Invitation>();
const columns = h.columns([
  h.accessor("email", { header: "E-mail", sortFn: "text" }),
  h.accessor((i) => ROLE_LABELS[i.role] ?? i.role, { id: "role", header: "Role", sortFn: "text" }),
  h.accessor("state", {
    header: "State",
    sortFn: "text",
    cell: (c) => {
      const s = STATE[c.row.original.state] ?? { label: c.row.original.state, className: "bg-panel" };
      return (
        <span className={`rounded-sm px-1.5 py-0.5 text-xs font-semibold ${s.className}`}>{s.label}</span>
      );
    },
  }),
  // Only the server's `invite-admin` command invites without a person (the first admin).
  h.accessor((i) => i.invitedBy?.displayName ?? "Command line (npm run invite-admin)", {
    id: "invitedBy",
    header: "Invited by",
    sortFn: "text",
  }),
  h.accessor((i) => timeOf(i.createdAt), {
    id: "sent",
    header: "Sent",
    cell: (c) => <span className="num">{formatDateTime(c.row.original.createdAt)}</span>,
  }),
  h.accessor((i) => timeOf(i.expiresAt), {
    id: "expires",
    header: "Link expires",
    cell: (c) => <span className="num">{formatDateTime(c.row.original.expiresAt)}</span>,
  }),
]);

export function InvitationsTable({ invitations }: { invitations: Invitation[] }) {
  return (
    <DataTable
      label="Invitations"
      testId="invitations-table"
      columns={columns}
      data={invitations}
      getRowId={(i) => String(i.id)}
      initialSorting={[{ id: "sent", desc: true }]}
      empty="No invitations have been sent."
    />
  );
}
