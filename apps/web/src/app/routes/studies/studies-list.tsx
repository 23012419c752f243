import { Link } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { paths } from "@/config/paths";
import { useStudies } from "@/features/studies/api/get-studies";
import { StudyList } from "@/features/studies/components/study-list";
import { Authorization } from "@/lib/authorization";

export function StudiesListRoute() {
  const studies = useStudies();
  return (
    <div>
      <div className="mb-6 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-semibold text-spruce">Studies</h1>
          <p className="mt-1 text-ink-soft">
            Each study compares one measured outcome across three or more independent groups.
          </p>
        </div>
        <Authorization permission="studies:create">
          <Link
            to={paths.newStudy}
            className="rounded-md bg-spruce px-4 py-2 text-sm font-semibold text-stone no-underline hover:bg-spruce-700 hover:no-underline"
          >
            Start a study
          </Link>
        </Authorization>
      </div>
      {studies.isPending && <p className="text-ink-soft">Loading…</p>}
      {studies.error && (
        <ErrorPanel title="The studies could not be loaded" message={studies.error.message} />
      )}
      {studies.data && <StudyList studies={studies.data} />}
    </div>
  );
}
