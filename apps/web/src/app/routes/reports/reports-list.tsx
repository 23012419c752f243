import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { useApprovedStudies } from "@/features/reports/api/get-approved-studies";
import { ApprovedStudiesTable } from "@/features/reports/components/approved-studies-table";

export function ReportsListRoute() {
  const studies = useApprovedStudies();
  const [filter, setFilter] = useState("");
  return (
    <div className="flex flex-col gap-5">
      <header>
        <h1 className="text-3xl font-semibold text-spruce">Reports</h1>
        <p className="mt-1 max-w-prose text-ink-soft">
          Approved studies, each with its methods-and-results section ready to read, copy or download.
        </p>
      </header>
      <div className="flex flex-col gap-1">
        <label htmlFor="reports-filter" className="text-sm font-medium">
          Find a study, analyst or outcome
        </label>
        <input
          id="reports-filter"
          type="search"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          className="w-72 rounded-md border border-ink/25 bg-paper px-3 py-2 outline-none focus:border-spruce focus:ring-2 focus:ring-spruce/30"
        />
      </div>
      {studies.isPending && <p className="text-ink-soft">Loading the approved studies…</p>}
      {studies.error && (
        <ErrorPanel title="The studies could not be loaded" message={studies.error.message} />
      )}
      {studies.data && <ApprovedStudiesTable studies={studies.data} filter={filter} />}
    </div>
  );
}
