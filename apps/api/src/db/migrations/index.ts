import { CreateUsersAndSessions1764626400000 } from "./1764626400000-create-users-and-sessions.js";
import { CreateStudiesDatasetsAnalyses1764630000000 } from "./1764630000000-create-studies-datasets-analyses.js";
import { CreateAuditEvents1764633600000 } from "./1764633600000-create-audit-events.js";
import { CreateReviewMailPeople1764637200000 } from "./1764637200000-create-review-mail-people.js";
import { AddActiveDataset1764700000000 } from "./1764700000000-add-active-dataset.js";
import { CreateReviewReplies1764700000001 } from "./1764700000001-create-review-replies.js";
import { PosthocMethodIds1764806400000 } from "./1764806400000-posthoc-method-ids.js";
import { CreateSignInThrottle1764900000000 } from "./1764900000000-create-sign-in-throttle.js";
import { MailOutboxClaims1764900000001 } from "./1764900000001-mail-outbox-claims.js";
import { CreateAnalysisRuns1764900000100 } from "./1764900000100-create-analysis-runs.js";
import { DataChangeMarker1764900000200 } from "./1764900000200-data-change-marker.js";
import { InvitationsFromCommandLine1764950000000 } from "./1764950000000-invitations-from-command-line.js";

/** Migrations in order; listed explicitly so they load the same from src (tsx) and dist. */
export const migrations = [
  CreateUsersAndSessions1764626400000,
  CreateStudiesDatasetsAnalyses1764630000000,
  CreateAuditEvents1764633600000,
  CreateReviewMailPeople1764637200000,
  AddActiveDataset1764700000000,
  CreateReviewReplies1764700000001,
  PosthocMethodIds1764806400000,
  CreateSignInThrottle1764900000000,
  MailOutboxClaims1764900000001,
  CreateAnalysisRuns1764900000100,
  DataChangeMarker1764900000200,
  InvitationsFromCommandLine1764950000000,
];
