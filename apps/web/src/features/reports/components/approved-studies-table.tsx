import { Link } from "react-router-dom";
import { columnHelper, DataTable, timeOf } from "@/components/ui/data-table";
import { reportPath } from "@/config/paths";
import { formatDate } from "@/lib/format";
import type { ReportStudy as ApprovedStudy } from "@waymark/contract";

const h = columnHelper<ApprovedStudy>();
const columns = h.columns([
  h.accessor("title", {
    header: "Study",
    sortFn: "text",
    cell: (c) => (
      <Link to={reportPath(c.row.original.id)} className="font-medium">
        {c.row.original.title}
      </Link>
    ),
  }),
  h.accessor((s) => s.owner?.displayName ?? "—", { id: "analyst", header: "Analyst", sortFn: "text" }),
  h.accessor("outcomeName", { header: "Outcome", sortFn: "text" }),
  h.accessor((s) => (Array.isArray(s.levels) ? s.levels.length : 0), {
    id: "groups",
    header: "Groups",
    meta: { align: "right" },
    cell: (c) => <span className="num">{c.getValue()}</span>,
  }),
  h.accessor((s) => timeOf(s.updatedAt), {
    id: "updated",
    header: "Last changed",
    cell: (c) => <span className="num">{formatDate(c.row.original.updatedAt)}</span>,
  }),
]);

export function ApprovedStudiesTable({ studies, filter }: { studies: ApprovedStudy[]; filter: string }) {
  return (
    <DataTable
      label="Approved studies"
      testId="approved-studies"
      columns={columns}
      data={studies}
      getRowId={(s) => String(s.id)}
      initialSorting={[{ id: "updated", desc: true }]}
      filter={filter}
      searchColumns={["title", "analyst", "outcomeName"]}
      empty={
        studies.length === 0 ? "No study has been approved yet." : "No approved study matches the filter."
      }
    />
  );
}
