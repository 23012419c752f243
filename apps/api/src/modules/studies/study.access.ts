import type { DataSource, EntityManager } from "typeorm";
import { lockRowForWrite } from "../../db/row-lock.js";
import { ConflictError, ForbiddenError, NotFoundError } from "../../http/errors.js";
import type { Study } from "./study.entity.js";
import { findStudies, type StudyFilter } from "./study-list-records.js";

type Db = DataSource | EntityManager;

/** Loads a study the caller may read: analysts their own, writers approved ones, other roles any. */
export async function loadReadableStudy(db: Db, id: number, user: Express.User): Promise<Study> {
  const valid = Number.isInteger(id) && id > 0;
  // Within a write transaction the study's state is checked under its row lock (PostgreSQL).
  if (valid) await lockRowForWrite(db, "studies", id);
  const study = valid ? ((await findStudies(db, { id }))[0] ?? null) : null;
  if (!study) throw new NotFoundError(`There is no study ${id}.`);
  assertReadable(study, user);
  return study;
}

/** Analysts read their own studies, writers approved ones, other roles any (also used on cached pages). */
export function assertReadable(study: Pick<Study, "ownerId" | "status">, user: Express.User): void {
  if (user.role === "analyst" && study.ownerId !== user.id)
    throw new ForbiddenError("This study belongs to another analyst.");
  // Writers turn approved results into text: drafts, their data and their analyses are not theirs to read.
  if (user.role === "writer" && study.status !== "approved")
    throw new ForbiddenError(
      `Writers see approved studies only; this study is ${study.status.replace("_", " ")}.`,
    );
}

/** Loads a study the caller may change: only its owning analyst, and only while it is a draft. */
export async function loadEditableStudy(db: Db, id: number, user: Express.User): Promise<Study> {
  const study = await loadReadableStudy(db, id, user);
  if (study.ownerId !== user.id) throw new ForbiddenError("Only the study's own analyst can change it.");
  if (study.status !== "draft")
    throw new ConflictError(`The study is ${study.status.replace("_", " ")}; it can change only as a draft.`);
  return study;
}

export function requireUnlockedPlan(study: Study): void {
  if (study.planLockedAt) {
    throw new ConflictError(
      `The plan was locked on ${study.planLockedAt.toISOString()}; the design, plan, levels and α can no longer change.`,
    );
  }
}

/** The studies a caller's list shows: analysts their own, writers approved ones, other roles all. */
export function listFilter(user: Express.User): StudyFilter {
  return user.role === "analyst"
    ? { ownerId: user.id }
    : user.role === "writer"
      ? { status: "approved" }
      : {};
}
