import { SignInThrottleCounter } from "../auth/sign-in-throttle-counter.entity.js";
import { Analysis } from "../modules/analyses/analysis.entity.js";
import { AnalysisRun } from "../modules/analyses/runs/analysis-run.entity.js";
import { AuditEvent } from "../modules/audit/audit-event.entity.js";
import { Dataset } from "../modules/datasets/dataset.entity.js";
import { Invitation } from "../modules/invitations/invitation.entity.js";
import { OutboxMessage } from "../modules/mail/outbox-message.entity.js";
import { ReceivedMessage } from "../modules/mail/received-message.entity.js";
import { OrganizationSettings } from "../modules/organization/organization-settings.entity.js";
import { ReviewComment } from "../modules/reviews/review-comment.entity.js";
import { ReviewRound } from "../modules/reviews/review-round.entity.js";
import { ReviewReply } from "../modules/reviews/review-reply.entity.js";
import { Signature } from "../modules/reviews/signature.entity.js";
import { Session } from "../modules/sessions/session.entity.js";
import { Study } from "../modules/studies/study.entity.js";
import { User } from "../modules/users/user.entity.js";

/** Every entity, listed once: the data source and the tests both read this. */
export const entities = [
  User,
  Session,
  Study,
  Dataset,
  Analysis,
  AnalysisRun,
  AuditEvent,
  ReviewRound,
  ReviewComment,
  ReviewReply,
  Signature,
  OutboxMessage,
  ReceivedMessage,
  Invitation,
  SignInThrottleCounter,
  OrganizationSettings,
];
