import { Link, useParams } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { paths } from "@/config/paths";
import { ReportPage } from "@/features/reports/components/report-page";

export function ReportRoute() {
  const { studyId } = useParams();
  const id = Number(studyId);
  if (!Number.isInteger(id) || id <= 0)
    return <ErrorPanel title="No such study" message="The address does not name a study." />;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm">
        <Link to={paths.reports}>Reports</Link> <span className="text-ink-soft">/</span>
      </p>
      <h1 className="sr-only">Methods-and-results report</h1>
      <ReportPage studyId={id} />
    </div>
  );
}
