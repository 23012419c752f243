import type { DataSource, EntityManager } from "typeorm";
import { isPostgres } from "../../../db/driver.js";
import { inTransaction } from "../../../db/in-transaction.js";
import { AnalysisRun, type RunRequest } from "./analysis-run.entity.js";

/**
 * Every change to a run's claim, each a conditional write: it takes effect only while the run is
 * in the state the caller believes, and says whether it did. Leases are times on the instance's
 * own clock, so instances' clocks must agree to well within a lease (NTP does).
 */

/** Why a run failed, in the terms the request answers with. */
export interface RunFailure {
  status: number;
  code: string;
  message: string;
}

const leaseFrom = (leaseMs: number) => new Date(Date.now() + leaseMs);

/** SQL for "due": waiting, or running under a lease that lapsed (its instance stopped renewing it). */
const due = (p = "") => `(${p}status = 'queued' OR (${p}status = 'running' AND ${p}lease_until < :now))`;

/** Records a run already claimed by `me`: the instance that received the request runs it at once. */
export async function insertClaimedRun(
  ds: DataSource,
  me: string,
  leaseMs: number,
  r: { studyId: number; datasetId: number; request: RunRequest; requestedById: number; ip: string | null },
): Promise<AnalysisRun> {
  return inTransaction(ds, async (tx) => {
    const repo = tx.getRepository(AnalysisRun);
    return repo.save(
      repo.create({
        studyId: r.studyId,
        datasetId: r.datasetId,
        request: r.request,
        requestedById: r.requestedById,
        requestedFromIp: r.ip,
        status: "running",
        claimedBy: me,
        leaseUntil: leaseFrom(leaseMs),
        attempts: 1,
      }),
    );
  });
}

/**
 * Takes up to `limit` due runs for `me`. On PostgreSQL the candidates are locked with
 * `FOR UPDATE SKIP LOCKED` inside one transaction, so concurrent sweepers on other instances pass
 * over each other's rows instead of waiting; on SQLite (one writer) each claim is a conditional
 * UPDATE checked by its affected rows. A due run that has used all its attempts is marked failed
 * instead of claimed; those come back as `exhausted`.
 */
export async function claimDueRuns(
  ds: DataSource,
  me: string,
  o: { limit: number; leaseMs: number; maxAttempts: number },
): Promise<{ claimed: AnalysisRun[]; exhausted: number[] }> {
  const claimed: AnalysisRun[] = [];
  const exhausted: number[] = [];
  const now = new Date();
  if (isPostgres(ds)) {
    await inTransaction(ds, async (tx) => {
      const rows = await tx
        .getRepository(AnalysisRun)
        .createQueryBuilder("r")
        .where(due("r."), { now })
        .orderBy("r.id", "ASC")
        .limit(o.limit)
        .setLock("pessimistic_write")
        .setOnLocked("skip_locked")
        .getMany();
      for (const row of rows) await claimOne(tx, me, row.id, now, o, claimed, exhausted);
    });
    return { claimed, exhausted };
  }
  const candidates = await ds
    .getRepository(AnalysisRun)
    .createQueryBuilder("r")
    .select("r.id", "id")
    .where(due("r."), { now })
    .orderBy("r.id", "ASC")
    .limit(o.limit)
    .getRawMany<{ id: number }>();
  for (const { id } of candidates)
    await inTransaction(ds, (tx) => claimOne(tx, me, Number(id), now, o, claimed, exhausted));
  return { claimed, exhausted };
}

async function claimOne(
  tx: EntityManager,
  me: string,
  id: number,
  now: Date,
  o: { leaseMs: number; maxAttempts: number },
  claimed: AnalysisRun[],
  exhausted: number[],
): Promise<void> {
  const taken = await tx
    .createQueryBuilder()
    .update(AnalysisRun)
    .set({
      status: "running",
      claimedBy: me,
      leaseUntil: leaseFrom(o.leaseMs),
      attempts: () => "attempts + 1",
    })
    .where(`id = :id AND ${due()} AND attempts < :max`, { id, now, max: o.maxAttempts })
    .execute();
  if (taken.affected === 1) {
    claimed.push(await tx.getRepository(AnalysisRun).findOneByOrFail({ id }));
    return;
  }
  const failure = attemptsExhausted(o.maxAttempts);
  const ended = await tx
    .createQueryBuilder()
    .update(AnalysisRun)
    .set({
      status: "failed",
      claimedBy: null,
      leaseUntil: null,
      errorStatus: failure.status,
      errorCode: failure.code,
      errorMessage: failure.message,
    })
    .where(`id = :id AND ${due()} AND attempts >= :max`, { id, now, max: o.maxAttempts })
    .execute();
  if (ended.affected === 1) exhausted.push(id);
}

export function attemptsExhausted(maxAttempts: number): RunFailure {
  return {
    status: 500,
    code: "analysis_abandoned",
    message: `The analysis was started ${maxAttempts} times and each time its server stopped before it finished, so it was not started again. Try it once more; if it stops again, the dataset may need more memory or time than the server allows.`,
  };
}

/** A write made only while `me` still holds the run; false when the claim was lost. */
async function whileHeld(
  db: EntityManager,
  me: string,
  id: number,
  set: Partial<AnalysisRun>,
): Promise<boolean> {
  const r = await db
    .createQueryBuilder()
    .update(AnalysisRun)
    .set(set)
    .where(`id = :id AND claimed_by = :me AND status = 'running'`, { id, me })
    .execute();
  return r.affected === 1;
}

/**
 * Marks the run done inside the caller's transaction, before the analysis is written, so that on
 * PostgreSQL the run's row stays locked until the commit. False (and the caller rolls back) when
 * `me` no longer holds the run: another instance took it up, or this one gave it back.
 */
export function markDone(tx: EntityManager, me: string, id: number): Promise<boolean> {
  return whileHeld(tx, me, id, { status: "done", claimedBy: null, leaseUntil: null });
}

/** Links the finished run to its analysis, in the transaction that wrote both. */
export async function linkAnalysis(tx: EntityManager, id: number, analysisId: number): Promise<void> {
  await tx.getRepository(AnalysisRun).update({ id }, { analysisId });
}

export function markFailed(ds: DataSource, me: string, id: number, f: RunFailure): Promise<boolean> {
  return inTransaction(ds, (tx) =>
    whileHeld(tx, me, id, {
      status: "failed",
      claimedBy: null,
      leaseUntil: null,
      errorStatus: f.status,
      errorCode: f.code,
      errorMessage: f.message,
    }),
  );
}

/** Counts one more attempt on a run `me` holds, if any remain; false when none do or the claim is gone. */
export function nextAttempt(
  ds: DataSource,
  me: string,
  id: number,
  o: { leaseMs: number; maxAttempts: number },
): Promise<boolean> {
  return inTransaction(ds, async (tx) => {
    const r = await tx
      .createQueryBuilder()
      .update(AnalysisRun)
      .set({ attempts: () => "attempts + 1", leaseUntil: leaseFrom(o.leaseMs) })
      .where(`id = :id AND claimed_by = :me AND status = 'running' AND attempts < :max`, {
        id,
        me,
        max: o.maxAttempts,
      })
      .execute();
    return r.affected === 1;
  });
}

/** Extends the lease of the runs `me` still holds; returns their ids (the others were lost). */
export async function renewLeases(
  ds: DataSource,
  me: string,
  ids: number[],
  leaseMs: number,
): Promise<number[]> {
  if (ids.length === 0) return [];
  return inTransaction(ds, async (tx) => {
    await tx
      .createQueryBuilder()
      .update(AnalysisRun)
      .set({ leaseUntil: leaseFrom(leaseMs) })
      .where(`id IN (:...ids) AND claimed_by = :me AND status = 'running'`, { ids, me })
      .execute();
    const still = await tx
      .getRepository(AnalysisRun)
      .createQueryBuilder("r")
      .select("r.id", "id")
      .where(`r.id IN (:...ids) AND r.claimed_by = :me AND r.status = 'running'`, { ids, me })
      .getRawMany<{ id: number }>();
    return still.map((r) => Number(r.id));
  });
}

/**
 * Gives back every run `me` holds, for another instance to take up at once: queued again, and the
 * attempt not counted, since the run did not fail. A computation still going here then finds its
 * claim gone and drops its result.
 */
export function releaseRuns(ds: DataSource, me: string): Promise<number> {
  return inTransaction(ds, async (tx) => {
    const r = await tx
      .createQueryBuilder()
      .update(AnalysisRun)
      .set({ status: "queued", claimedBy: null, leaseUntil: null, attempts: () => "attempts - 1" })
      .where(`claimed_by = :me AND status = 'running'`, { me })
      .execute();
    return r.affected ?? 0;
  });
}
