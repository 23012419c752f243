import { Download } from "lucide-react";
import { useSearchParams } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { auditCsvHref, useAuditEvents } from "@/features/audit/api/get-audit-events";
import { filtersFromParams, filtersToQuery, type AuditFilters } from "@/features/audit/audit-query";
import { AuditFilterForm } from "@/features/audit/components/audit-filter-form";
import { AuditTable } from "@/features/audit/components/audit-table";

const LIMIT = 500;

export function AuditRoute() {
  const [params, setParams] = useSearchParams();
  const filters = filtersFromParams(params);
  const qs = filtersToQuery(filters);
  const events = useAuditEvents(filters);
  const apply = (f: AuditFilters) => setParams(new URLSearchParams(filtersToQuery(f)));
  return (
    <div className="flex flex-col gap-5">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-semibold text-spruce">Audit trail</h1>
          <p className="mt-1 max-w-prose text-ink-soft">
            Every recorded action, newest first. Nothing here can be changed or deleted.
          </p>
        </div>
        <a
          href={auditCsvHref(filters)}
          download
          className="inline-flex items-center gap-2 rounded-md border border-ink/25 bg-paper px-4 py-2 text-sm font-semibold text-ink no-underline hover:border-ink/50 hover:no-underline"
        >
          <Download aria-hidden="true" className="h-4 w-4" /> Export these events as CSV
        </a>
      </header>
      <AuditFilterForm key={qs} value={filters} onApply={apply} />
      {events.isPending && <p className="text-ink-soft">Loading the events…</p>}
      {events.error && <ErrorPanel title="The events could not be loaded" message={events.error.message} />}
      {events.data && (
        <>
          <p className="text-sm text-ink-soft" role="status">
            {events.data.length === LIMIT
              ? `Showing the latest ${LIMIT} matching events; narrow the filters to see older ones.`
              : `${events.data.length} matching event${events.data.length === 1 ? "" : "s"}.`}
          </p>
          <AuditTable events={events.data} />
        </>
      )}
    </div>
  );
}
