import { Link } from "react-router-dom";
import { AttentionMarker } from "@/components/ui/attention-marker";
import { columnHelper, DataTable, timeOf } from "@/components/ui/data-table";
import { studyPath } from "@/config/paths";
import { formatDateTime } from "@/lib/format";
import { actionLabel, FLAGGED_ACTIONS } from "../actions";
import type { AuditEvent } from "../api/get-audit-events";

function changeText(x: unknown): string | null {
  if (x === null || x === undefined) return null;
  if (typeof x === "object" && Object.keys(x as object).length === 0) return null;
  try {
    return JSON.stringify(x, null, 2);
  } catch {
    return null;
  }
}

function Changes({ e }: { e: AuditEvent }) {
  const before = changeText(e.before);
  const after = changeText(e.after);
  if (!before && !after) return <span className="text-ink-soft">—</span>;
  return (
    <details>
      <summary className="cursor-pointer text-lake">Show</summary>
      <div className="mt-1 grid gap-2 text-xs">
        {before && (
          <div>
            <p className="font-semibold">Before</p>
            <pre className="num max-w-xs overflow-x-auto whitespace-pre-wrap rounded bg-stone p-2">
              {before}
            </pre>
          </div>
        )}
        {after && (
          <div>
            <p className="font-semibold">After</p>
            <pre className="num max-w-xs overflow-x-auto whitespace-pre-wrap rounded bg-stone p-2">
              {after}
            </pre>
          </div>
        )}
      </div>
    </details>
  );
}

const h = columnHelper<AuditEvent>();
const columns = h.columns([
  h.accessor((e) => timeOf(e.at), {
    id: "at",
    header: "When",
    cell: (c) => <span className="num whitespace-nowrap">{formatDateTime(c.row.original.at)}</span>,
  }),
  h.accessor((e) => e.actorEmail ?? "system", { id: "actor", header: "Person", sortFn: "text" }),
  h.accessor((e) => actionLabel(e.action), {
    id: "action",
    header: "Action",
    sortFn: "text",
    cell: (c) => {
      const e = c.row.original;
      return FLAGGED_ACTIONS.has(e.action) ? (
        <AttentionMarker>{actionLabel(e.action)}</AttentionMarker>
      ) : (
        <span>{actionLabel(e.action)}</span>
      );
    },
  }),
  h.accessor((e) => e.studyId ?? 0, {
    id: "study",
    header: "Study",
    meta: { align: "right" },
    cell: (c) => {
      const id = c.row.original.studyId;
      return id ? (
        <Link to={studyPath(id)} className="num">
          {id}
        </Link>
      ) : (
        <span className="text-ink-soft">—</span>
      );
    },
  }),
  h.accessor("summary", {
    header: "What happened",
    enableSorting: false,
    cell: (c) => <span className="break-words">{c.row.original.summary}</span>,
  }),
  h.accessor((e) => e.ip ?? "", {
    id: "ip",
    header: "From address",
    enableSorting: false,
    cell: (c) => <span className="num text-xs">{c.row.original.ip ?? "—"}</span>,
  }),
  h.display({ id: "changes", header: "Changes", cell: (c) => <Changes e={c.row.original} /> }),
]);

/** The filtered audit trail, newest first; overrides and failures carry the amber marker. */
export function AuditTable({ events }: { events: AuditEvent[] }) {
  return (
    <DataTable
      label="Audit events"
      testId="audit-table"
      columns={columns}
      data={events}
      getRowId={(e) => String(e.id)}
      initialSorting={[{ id: "at", desc: true }]}
      empty="No recorded action matches these filters."
    />
  );
}
