import { useMemo, useState } from "react";
import { Link } from "react-router-dom";
import { columnHelper, DataTable, timeOf } from "@/components/ui/data-table";
import { reviewPath } from "@/config/paths";
import { formatDate } from "@/lib/format";
import { daysLabel } from "../labels";
import { testTitle } from "@/lib/labels";
import type { QueueItem } from "@waymark/contract";
import { OverrideFlag } from "./override-flag";

const h = columnHelper<QueueItem>();
const columns = h.columns([
  h.accessor("title", {
    header: "Study",
    sortFn: "text",
    cell: (c) => (
      <span className="flex flex-col">
        <Link to={reviewPath(c.row.original.studyId)} className="font-medium">
          {c.row.original.title}
        </Link>
        {c.row.original.round > 1 && (
          <span className="text-xs text-ink-soft">Round {c.row.original.round}</span>
        )}
      </span>
    ),
  }),
  h.accessor((r) => r.analyst?.displayName ?? "—", { id: "analyst", header: "Analyst", sortFn: "text" }),
  h.accessor((r) => timeOf(r.submittedAt), {
    id: "submitted",
    header: "Submitted",
    cell: (c) => <span className="num">{formatDate(c.row.original.submittedAt)}</span>,
  }),
  h.accessor((r) => testTitle(r.chosenTest), {
    id: "test",
    header: "Plan's test → run",
    sortFn: "text",
    cell: (c) => {
      const r = c.row.original;
      return r.recommendedTest === r.chosenTest ? (
        <span>
          {testTitle(r.chosenTest)} <span className="text-ink-soft">(as planned)</span>
        </span>
      ) : (
        <span>
          <span className="text-ink-soft">{testTitle(r.recommendedTest)}</span> →{" "}
          <span className="font-medium">{testTitle(r.chosenTest)}</span>
        </span>
      );
    },
  }),
  h.accessor((r) => (r.override ? 1 : 0), {
    id: "override",
    header: "Deviation",
    cell: (c) => <OverrideFlag override={c.row.original.override} />,
  }),
  h.accessor((r) => (Number.isFinite(r.daysWaiting) ? r.daysWaiting : -1), {
    id: "daysWaiting",
    header: "Waiting",
    meta: { align: "right" },
    sortDescFirst: true,
    cell: (c) => <span className="num">{daysLabel(c.row.original.daysWaiting)}</span>,
  }),
]);

const SEARCH = ["title", "analyst"] as const;

/** The studies waiting for a decision, longest-waiting first, with a text filter and an override filter. */
export function ReviewQueueTable({ queue }: { queue: QueueItem[] }) {
  const [filter, setFilter] = useState("");
  const [overridesOnly, setOverridesOnly] = useState(false);
  const data = useMemo(
    () => (overridesOnly ? queue.filter((q) => q.override) : queue),
    [queue, overridesOnly],
  );
  const overrides = queue.filter((q) => q.override).length;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-4">
        <div className="flex flex-col gap-1">
          <label htmlFor="queue-filter" className="text-sm font-medium">
            Find a study or analyst
          </label>
          <input
            id="queue-filter"
            type="search"
            value={filter}
            onChange={(e) => setFilter(e.target.value)}
            className="w-72 rounded-md border border-ink/25 bg-paper px-3 py-2 outline-none focus:border-spruce focus:ring-2 focus:ring-spruce/30"
          />
        </div>
        <label className="flex items-center gap-2 pb-2 text-sm">
          <input
            type="checkbox"
            checked={overridesOnly}
            onChange={(e) => setOverridesOnly(e.target.checked)}
            className="h-4 w-4 accent-spruce"
          />
          Only studies with a deviation from the plan ({overrides})
        </label>
      </div>
      <DataTable
        label="Studies waiting for review"
        testId="review-queue"
        columns={columns}
        data={data}
        getRowId={(r) => String(r.studyId)}
        initialSorting={[{ id: "daysWaiting", desc: true }]}
        filter={filter}
        searchColumns={SEARCH}
        rowClassName={(r) => (r.override ? "bg-amber-100/40" : undefined)}
        empty={queue.length === 0 ? "No study is waiting for review." : "No study matches the filter."}
      />
    </div>
  );
}
