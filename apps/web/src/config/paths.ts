import { REVIEW_STEPS } from "@waymark/contract";

/** Every route path of the web app, in one place. */
export const paths = {
  signIn: "/sign-in",
  home: "/",
  studies: "/studies",
  newStudy: "/studies/new",
  study: "/studies/:studyId",
  reviews: "/reviews",
  review: "/reviews/:studyId",
  audit: "/audit",
  people: "/people",
  settings: "/settings",
  invitation: "/invite/:token",
  devMailbox: "/dev/mailbox",
  reports: "/reports",
  report: "/reports/:studyId",
} as const;

/** The steps of a study, each a sub-route of the study page: the steps a reviewer comments on. */
export const STUDY_STEP_SEGMENTS = REVIEW_STEPS;
export type StudyStepSegment = (typeof STUDY_STEP_SEGMENTS)[number];

/** Links into one study: the overview, or one of its steps. */
export const studyPath = (studyId: number | string, step?: StudyStepSegment) =>
  `/studies/${studyId}${step ? `/${step}` : ""}`;

/** The review page of one study. */
export const reviewPath = (studyId: number | string) => `/reviews/${studyId}`;

/** The report page of one approved study. */
export const reportPath = (studyId: number | string) => `/reports/${studyId}`;
