import { createBrowserRouter } from "react-router-dom";
import { paths } from "@/config/paths";
import { RequireUser } from "./require-user";
import { RequirePermission } from "./require-permission";
import { AuditRoute } from "./routes/audit";
import { DevMailboxRoute } from "./routes/dev-mailbox";
import { InviteRoute } from "./routes/invite";
import { PeopleRoute } from "./routes/people";
import { ReportRoute } from "./routes/reports/report";
import { ReportsListRoute } from "./routes/reports/reports-list";
import { ReviewQueueRoute } from "./routes/reviews/review-queue";
import { SettingsRoute } from "./routes/settings";
import { HomeRoute } from "./routes/home";
import { NotFoundRoute } from "./routes/not-found";
import { SignInRoute } from "./routes/sign-in";
import { NewStudyRoute } from "./routes/studies/new-study";
import { StudiesListRoute } from "./routes/studies/studies-list";
import { StudyChoiceRoute } from "./routes/studies/study-choice";
import { StudyDataRoute } from "./routes/studies/study-data";
import { StudyDesignRoute } from "./routes/studies/study-design";
import { StudyLayoutRoute } from "./routes/studies/study-layout";
import { StudyOverviewRoute } from "./routes/studies/study-overview";

/** Steps that draw charts load on demand, so the charting library stays out of the first download. */
export function createRouter() {
  return createBrowserRouter([
    { path: paths.signIn, element: <SignInRoute /> },
    { path: paths.invitation, element: <InviteRoute /> },
    { path: paths.devMailbox, element: <DevMailboxRoute /> },
    {
      element: <RequireUser />,
      children: [
        { path: paths.home, element: <HomeRoute /> },
        { path: paths.studies, element: <StudiesListRoute /> },
        { path: paths.newStudy, element: <NewStudyRoute /> },
        {
          element: <RequirePermission permission="reviews:view" />,
          children: [
            { path: paths.reviews, element: <ReviewQueueRoute /> },
            // The review page shows the results with their charts, so it loads on demand too.
            {
              path: paths.review,
              lazy: () =>
                import("./routes/reviews/review-study").then((m) => ({ Component: m.ReviewStudyRoute })),
            },
          ],
        },
        {
          path: paths.audit,
          element: (
            <RequirePermission permission="audit:view">
              <AuditRoute />
            </RequirePermission>
          ),
        },
        {
          path: paths.people,
          element: (
            <RequirePermission permission="people:manage">
              <PeopleRoute />
            </RequirePermission>
          ),
        },
        {
          path: paths.settings,
          element: (
            <RequirePermission permission="settings:manage">
              <SettingsRoute />
            </RequirePermission>
          ),
        },
        {
          element: <RequirePermission permission="reports:view" />,
          children: [
            { path: paths.reports, element: <ReportsListRoute /> },
            { path: paths.report, element: <ReportRoute /> },
          ],
        },
        {
          path: paths.study,
          element: <StudyLayoutRoute />,
          children: [
            { index: true, element: <StudyOverviewRoute /> },
            { path: "design", element: <StudyDesignRoute /> },
            {
              path: "plan",
              lazy: () =>
                import("./routes/studies/study-plan").then((m) => ({ Component: m.StudyPlanRoute })),
            },
            { path: "data", element: <StudyDataRoute /> },
            {
              path: "checks",
              lazy: () =>
                import("./routes/studies/study-checks").then((m) => ({ Component: m.StudyChecksRoute })),
            },
            { path: "choice", element: <StudyChoiceRoute /> },
            {
              path: "results",
              lazy: () =>
                import("./routes/studies/study-results").then((m) => ({ Component: m.StudyResultsRoute })),
            },
            { path: "*", element: <NotFoundRoute /> },
          ],
        },
      ],
    },
    { path: "*", element: <NotFoundRoute /> },
  ]);
}
