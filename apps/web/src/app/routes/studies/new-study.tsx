import { Navigate, useNavigate } from "react-router-dom";
import { paths, studyPath } from "@/config/paths";
import { useMe } from "@/lib/current-user";
import { CreateStudyForm } from "@/features/studies/components/create-study-form";
import { can } from "@/lib/authorization";

export function NewStudyRoute() {
  const me = useMe();
  const navigate = useNavigate();
  if (me.data && !can(me.data.role, "studies:create")) return <Navigate to={paths.studies} replace />;
  return (
    <div>
      <h1 className="text-3xl font-semibold text-spruce">Start a study</h1>
      <p className="mb-6 mt-1 max-w-prose text-ink-soft">
        Say what is measured and across which groups. The design questions and the plan come next, all before
        any data are uploaded.
      </p>
      <CreateStudyForm onCreated={(s) => navigate(studyPath(s.id, "design"))} />
    </div>
  );
}
