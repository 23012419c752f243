import { In, type DataSource, type EntityManager } from "typeorm";
import { Analysis } from "../analyses/analysis.entity.js";
import { Dataset } from "../datasets/dataset.entity.js";
import { ReviewComment } from "../reviews/review-comment.entity.js";
import { ReviewReply } from "../reviews/review-reply.entity.js";
import { ReviewRound } from "../reviews/review-round.entity.js";
import { missingDesignAnswer, outOfScopeReason } from "./design.js";
import { User } from "../users/user.entity.js";
import { Study } from "./study.entity.js";
import type { StudyStatusRecords } from "./study-status.js";
import { presentOpenReview, type OpenReview } from "./study-status-records.js";

type Db = DataSource | EntityManager;

/** Everything `presentStudy` needs beside the study row, for one study. */
export interface StudyViewRecords {
  datasetCount: number;
  latestDataset: Dataset | null;
  latestAnalysisId: number | null;
  activeDataset: Dataset | null;
  status: StudyStatusRecords;
  openReview: OpenReview | null;
}

/**
 * Ids per query: far under SQLite's 32,766 and PostgreSQL's 65,535 bound parameters, so a list
 * of any length runs the same few queries per block of this many studies.
 */
const BLOCK = 500;

const byKey = <T, K>(rows: T[], key: (r: T) => K) => {
  const m = new Map<K, T[]>();
  for (const r of rows) {
    const list = m.get(key(r));
    if (list) list.push(r);
    else m.set(key(r), [r]);
  }
  return m;
};

/** Which studies a list shows (the route decides by the caller's role), or one study by id. */
export type StudyFilter =
  { id: number } | { ownerId: number } | { status: "approved" } | Record<string, never>;

/**
 * The studies a list shows, newest change first, with their owner and the person who locked the
 * plan: the same rows `find` with eager relations gives, read as two plain queries (the eager
 * join costs more than everything else on the list).
 */
export async function findStudies(db: Db, filter: StudyFilter): Promise<Study[]> {
  const studies = await db
    .getRepository(Study)
    .createQueryBuilder("s")
    .where(filter)
    .orderBy("s.updatedAt", "DESC")
    .getMany();
  const userIds = new Set<number>();
  for (const s of studies) {
    userIds.add(s.ownerId);
    if (s.planLockedById !== null) userIds.add(s.planLockedById);
  }
  const users = new Map<number, User>();
  const all = [...userIds];
  for (let i = 0; i < all.length; i += BLOCK)
    for (const u of await db.getRepository(User).findBy({ id: In(all.slice(i, i + BLOCK)) }))
      users.set(u.id, u);
  for (const s of studies) {
    s.owner = users.get(s.ownerId)!;
    s.planLockedBy = s.planLockedById !== null ? (users.get(s.planLockedById) ?? null) : null;
  }
  return studies;
}

/**
 * The records of many studies in a fixed number of queries, whatever their count: the same
 * answers `loadStatusRecords`, `openReviewComments` and `studyDto` read one study at a time
 * (study-list-records.test.ts holds the two paths equal), for the list and the study page.
 */
export async function loadStudyViews(db: Db, studies: Study[]): Promise<Map<number, StudyViewRecords>> {
  const out = new Map<number, StudyViewRecords>();
  for (let i = 0; i < studies.length; i += BLOCK) {
    const block = studies.slice(i, i + BLOCK);
    for (const [id, v] of await loadBlock(db, block)) out.set(id, v);
  }
  return out;
}

async function loadBlock(db: Db, studies: Study[]): Promise<Map<number, StudyViewRecords>> {
  const ids = studies.map((s) => s.id);
  const out = new Map<number, StudyViewRecords>();
  if (ids.length === 0) return out;

  // 1–3: every version's number (small rows), the newest analysis per data version, the last rounds.
  const [versionRows, analysisRows, rounds] = await Promise.all([
    db
      .getRepository(Dataset)
      .createQueryBuilder("d")
      .select("d.id", "id")
      .addSelect("d.studyId", "studyId")
      .addSelect("d.version", "version")
      .where("d.studyId IN (:...ids)", { ids })
      .getRawMany<{ id: number; studyId: number; version: number }>(),
    db
      .getRepository(Analysis)
      .createQueryBuilder("a")
      .select("a.studyId", "studyId")
      .addSelect("a.datasetId", "datasetId")
      .addSelect("MAX(a.id)", "id")
      .where("a.studyId IN (:...ids)", { ids })
      .groupBy("a.studyId")
      .addGroupBy("a.datasetId")
      .getRawMany<{ studyId: number; datasetId: number; id: number }>(),
    db
      .getRepository(ReviewRound)
      .createQueryBuilder("r")
      .leftJoinAndSelect("r.decidedBy", "decidedBy")
      .where("r.studyId IN (:...ids)", { ids })
      .andWhere((qb) => {
        const newest = qb
          .subQuery()
          .select("MAX(r2.round)")
          .from(ReviewRound, "r2")
          .where("r2.studyId = r.studyId")
          .getQuery();
        return `r.round = ${newest}`;
      })
      .getMany(),
  ]);
  // PostgreSQL answers aggregates and some integers as text; numbers from here on.
  const versions = versionRows.map((r) => ({
    id: Number(r.id),
    studyId: Number(r.studyId),
    version: Number(r.version),
  }));
  const newestPerVersion = analysisRows.map((r) => ({
    studyId: Number(r.studyId),
    datasetId: Number(r.datasetId),
    id: Number(r.id),
  }));
  const versionOf = new Map(versions.map((v) => [v.id, v]));
  const versionsByStudy = byKey(versions, (v) => v.studyId);
  const analysesByStudy = byKey(newestPerVersion, (a) => a.studyId);
  const roundOf = new Map(rounds.map((r) => [r.studyId, r]));

  // The active version: the one made active (when it is this study's), else the newest upload.
  const picks = new Map<number, { active: number | null; latest: number | null }>();
  for (const s of studies) {
    const own = versionsByStudy.get(s.id) ?? [];
    let latest: (typeof own)[number] | null = null;
    for (const v of own) if (!latest || v.version > latest.version) latest = v;
    const chosen =
      s.activeDatasetId !== null && s.activeDatasetId !== undefined
        ? own.find((v) => v.id === s.activeDatasetId)
        : undefined;
    picks.set(s.id, { active: (chosen ?? latest)?.id ?? null, latest: latest?.id ?? null });
  }

  // 4–6: the full rows of the latest and active versions, comment counts, the open rounds' comments.
  const fullIds = [
    ...new Set([...picks.values()].flatMap((p) => [p.active, p.latest]).filter((x) => x !== null)),
  ];
  const roundIds = rounds.map((r) => r.id);
  const openRoundIds = rounds.filter((r) => r.decision === "changes_requested").map((r) => r.id);
  const [fullRows, countRows, openComments] = await Promise.all([
    fullIds.length ? db.getRepository(Dataset).find({ where: { id: In(fullIds) } }) : [],
    roundIds.length
      ? db
          .getRepository(ReviewComment)
          .createQueryBuilder("c")
          .select("c.roundId", "roundId")
          .addSelect("COUNT(*)", "n")
          .where("c.roundId IN (:...roundIds)", { roundIds })
          .groupBy("c.roundId")
          .getRawMany<{ roundId: number; n: number | string }>()
      : [],
    openRoundIds.length
      ? db.getRepository(ReviewComment).find({ where: { roundId: In(openRoundIds) }, order: { id: "ASC" } })
      : [],
  ]);
  // 7: the analyst's replies to those comments.
  const replies = openComments.length
    ? await db
        .getRepository(ReviewReply)
        .find({ where: { commentId: In(openComments.map((c) => c.id)) }, order: { id: "ASC" } })
    : [];
  const full = new Map(fullRows.map((d) => [d.id, d]));
  const commentCount = new Map(countRows.map((r) => [Number(r.roundId), Number(r.n)]));
  const commentsByRound = byKey(openComments, (c) => c.roundId);

  for (const s of studies) {
    const pick = picks.get(s.id)!;
    const active = pick.active !== null ? versionOf.get(pick.active)! : null;
    const newest = analysesByStudy.get(s.id) ?? [];
    let latestAnalysis: (typeof newest)[number] | null = null;
    let onActive: (typeof newest)[number] | null = null;
    for (const a of newest) {
      if (!latestAnalysis || a.id > latestAnalysis.id) latestAnalysis = a;
      if (active && a.datasetId === active.id && (!onActive || a.id > onActive.id)) onActive = a;
    }
    const round = roundOf.get(s.id) ?? null;
    out.set(s.id, {
      datasetCount: (versionsByStudy.get(s.id) ?? []).length,
      latestDataset: pick.latest !== null ? (full.get(pick.latest) ?? null) : null,
      latestAnalysisId: latestAnalysis?.id ?? null,
      activeDataset: pick.active !== null ? (full.get(pick.active) ?? null) : null,
      status: {
        status: s.status,
        outOfScope: outOfScopeReason(s.design),
        designComplete: missingDesignAnswer(s.design, !!s.controlLevel) === null,
        planLocked: !!s.planLockedAt,
        activeDataset: active ? { id: active.id, version: active.version } : null,
        analysisOnActive: onActive ? { id: onActive.id } : null,
        latestAnalysis: latestAnalysis
          ? { id: latestAnalysis.id, datasetVersion: versionOf.get(latestAnalysis.datasetId)?.version ?? 0 }
          : null,
        lastRound: round
          ? {
              round: round.round,
              decision: round.decision,
              analysisId: round.analysisId,
              datasetVersion: versionOf.get(round.datasetId)?.version ?? 0,
              commentCount: commentCount.get(round.id) ?? 0,
            }
          : null,
      },
      openReview:
        round && round.decision === "changes_requested"
          ? presentOpenReview(round, commentsByRound.get(round.id) ?? [], replies)
          : null,
    });
  }
  return out;
}
