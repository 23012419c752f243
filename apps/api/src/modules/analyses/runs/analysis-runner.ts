import { newInstanceId } from "../../../lifecycle/instance-id.js";
import type { DataSource } from "typeorm";
import type { Env } from "../../../config/env.js";
import { inTransaction } from "../../../db/in-transaction.js";
import { pauseAt } from "../../../db/pause-points.js";
import type { Actor } from "../../../http/actor.js";
import { isDraining } from "../../../lifecycle/shutdown.js";
import { toHttpError } from "../../../http/error-handler.js";
import { HttpError } from "../../../http/errors.js";
import { toPublicUser, User } from "../../users/user.entity.js";
import { Analysis } from "../analysis.entity.js";
import {
  checkRunRequest,
  computeAnalysis,
  runEngine,
  storeAnalysis,
  type AnalysisEngine,
  type RunInput,
} from "../analysis.service.js";
import { AnalysisRun } from "./analysis-run.entity.js";
import {
  attemptsExhausted,
  claimDueRuns,
  insertClaimedRun,
  linkAnalysis,
  markDone,
  markFailed,
  nextAttempt,
  releaseRuns,
  renewLeases,
  type RunFailure,
} from "./run-claims.js";

export interface RunSettings {
  leaseMs: number;
  renewMs: number;
  sweepMs: number;
  maxAttempts: number;
  sweepConcurrency: number;
  /** How long a request waits for a run another instance took over before answering 503. */
  waitMs: number;
}

export function runSettingsFrom(env: Env): RunSettings {
  const leaseMs = env.ANALYSIS_RUN_LEASE_SECONDS * 1000;
  return {
    leaseMs,
    renewMs: env.ANALYSIS_RUN_RENEW_SECONDS * 1000,
    sweepMs: env.ANALYSIS_RUN_SWEEP_SECONDS * 1000,
    maxAttempts: env.ANALYSIS_RUN_MAX_ATTEMPTS,
    sweepConcurrency: env.ANALYSIS_RUN_SWEEP_CONCURRENCY,
    // Long enough for every attempt to time out in the worker and its lease to lapse.
    waitMs: env.ANALYSIS_RUN_MAX_ATTEMPTS * (env.TASK_TIMEOUT_SECONDS * 1000 + leaseMs),
  };
}

type Outcome =
  | { kind: "done"; analysisId: number }
  | { kind: "failed"; error: unknown }
  /** Another instance holds the run now (or this one gave it back); its outcome will be theirs. */
  | { kind: "lost" };

/** Thrown inside the finishing transaction to roll it back when the claim is gone. */
class ClaimLost extends Error {}

const POLL_MS = 500;

/**
 * Runs analyses as leased rows (`analysis_runs`). A request records its run already claimed by
 * this instance and computes it at once; while it computes, a heartbeat renews the lease. Every
 * instance also sweeps for runs nobody holds: queued ones and those whose lease lapsed because
 * their instance died. A run ends in one transaction that writes the analysis, its audit events
 * and the run's "done" mark, and only while this instance still holds the claim.
 */
export class AnalysisRunner {
  /** Runs this instance holds and renews. */
  private readonly held = new Set<number>();
  private heartbeat: NodeJS.Timeout | null = null;
  private sweeper: NodeJS.Timeout | null = null;
  private claiming: Promise<void> | null = null;
  private sweptRunning = 0;

  constructor(
    private readonly ds: DataSource,
    readonly settings: RunSettings,
    private readonly engine: AnalysisEngine = runEngine,
    readonly instanceId: string = newInstanceId(),
  ) {}

  /** Starts sweeping every `sweepMs`; the timer does not keep the process alive. */
  start(): void {
    if (this.sweeper) return;
    this.sweeper = setInterval(() => {
      // A draining instance takes no new work; a closed data source (tests) has nothing to sweep.
      if (this.ds.isInitialized && !isDraining()) void this.sweepOnce().catch(logSweepError);
    }, this.settings.sweepMs);
    this.sweeper.unref();
  }

  /** Takes no more runs; runs in progress carry on. */
  stopSweeping(): void {
    if (this.sweeper) clearInterval(this.sweeper);
    this.sweeper = null;
  }

  /**
   * Gives back every run this instance holds, for another instance to take up at once; a
   * computation still going here drops its result. For shutdown, after requests in flight ended.
   */
  async releaseClaims(): Promise<number> {
    this.held.clear();
    this.renewWhileHeld();
    return releaseRuns(this.ds, this.instanceId);
  }

  /** For shutdown: no more claims, then every held run given back (a claim being taken lands first). */
  async stop(): Promise<number> {
    this.stopSweeping();
    await this.claiming?.catch(() => undefined);
    return this.releaseClaims();
  }

  /**
   * A request to run the plan: checks it, records the run claimed by this instance, computes it
   * here and answers with the stored analysis or the error, as a direct call would. If another
   * instance took the run over meanwhile, waits for that outcome.
   */
  async request(actor: Actor, studyId: number, input: RunInput): Promise<Analysis> {
    const study = await checkRunRequest(this.ds, actor.user, studyId, input.datasetId);
    const run = await insertClaimedRun(this.ds, this.instanceId, this.settings.leaseMs, {
      studyId: study.id,
      datasetId: input.datasetId,
      request: { test: input.test, justification: input.justification },
      requestedById: actor.user.id,
      ip: actor.ip,
    });
    const outcome = await this.execute(run, actor);
    if (outcome.kind === "failed") throw outcome.error;
    const analysisId = outcome.kind === "done" ? outcome.analysisId : await this.awaitOutcome(run.id);
    return this.ds.getRepository(Analysis).findOneByOrFail({ id: analysisId });
  }

  /**
   * One sweep: claims due runs up to the sweep's concurrency and computes them. Resolves when
   * the runs it took have ended. Overlapping calls share one claiming step.
   */
  async sweepOnce(): Promise<void> {
    if (this.claiming) return this.claiming;
    let taken: AnalysisRun[] = [];
    this.claiming = (async () => {
      const room = this.settings.sweepConcurrency - this.sweptRunning;
      if (room <= 0) return;
      const { claimed, exhausted } = await claimDueRuns(this.ds, this.instanceId, {
        limit: room,
        leaseMs: this.settings.leaseMs,
        maxAttempts: this.settings.maxAttempts,
      });
      for (const id of exhausted)
        console.error(`analysis run ${id}: ${attemptsExhausted(this.settings.maxAttempts).message}`);
      taken = claimed;
      this.sweptRunning += taken.length;
    })().finally(() => (this.claiming = null));
    await this.claiming;
    await Promise.all(
      taken.map((run) =>
        this.executeSwept(run).finally(() => {
          this.sweptRunning -= 1;
        }),
      ),
    );
  }

  private async executeSwept(run: AnalysisRun): Promise<void> {
    const user = await this.ds.getRepository(User).findOneBy({ id: run.requestedById });
    if (!user?.active) {
      this.hold(run.id);
      try {
        await markFailed(this.ds, this.instanceId, run.id, {
          status: 403,
          code: "requester_inactive",
          message: "The person who asked for this analysis can no longer sign in, so it was not run.",
        });
      } finally {
        this.release(run.id);
      }
      return;
    }
    await this.execute(run, { user: toPublicUser(user), ip: run.requestedFromIp });
  }

  /**
   * Computes a run this instance holds and ends it. An error the request would answer with a
   * 4xx/5xx of its own (the plan's rules, the study's state, a task bound) ends the run at once;
   * any other error is retried while attempts remain.
   */
  private async execute(run: AnalysisRun, actor: Actor): Promise<Outcome> {
    const me = this.instanceId;
    this.hold(run.id);
    try {
      for (;;) {
        try {
          const computed = await computeAnalysis(
            this.ds,
            actor.user,
            run.studyId,
            { datasetId: run.datasetId, ...run.request },
            this.engine,
          );
          await pauseAt("analysis.before-store");
          const analysisId = await inTransaction(this.ds, async (tx) => {
            if (!(await markDone(tx, me, run.id))) throw new ClaimLost();
            const id = await storeAnalysis(tx, actor, computed);
            await linkAnalysis(tx, run.id, id);
            return id;
          });
          return { kind: "done", analysisId };
        } catch (e) {
          if (e instanceof ClaimLost) return { kind: "lost" };
          const known = toHttpError(e);
          const settings = this.settings;
          if (!known && (await nextAttempt(this.ds, me, run.id, settings))) continue;
          const failure: RunFailure = known
            ? { status: known.status, code: known.code, message: known.message }
            : {
                status: 500,
                code: "analysis_failed",
                message: `The analysis failed ${settings.maxAttempts} times and was not run again; the last error: ${e instanceof Error ? e.message : String(e)}`,
              };
          if (!known) console.error(`analysis run ${run.id}: ${failure.message}`);
          return (await markFailed(this.ds, me, run.id, failure))
            ? { kind: "failed", error: e }
            : { kind: "lost" };
        }
      }
    } finally {
      this.release(run.id);
    }
  }

  /** Waits for a run another instance holds to end; its analysis id, or its error thrown. */
  private async awaitOutcome(id: number): Promise<number> {
    const deadline = Date.now() + this.settings.waitMs;
    const repo = this.ds.getRepository(AnalysisRun);
    while (Date.now() < deadline) {
      const run = await repo.findOneByOrFail({ id });
      if (run.status === "done" && run.analysisId !== null) return run.analysisId;
      if (run.status === "failed")
        throw new HttpError(
          run.errorStatus ?? 500,
          run.errorCode ?? "analysis_failed",
          run.errorMessage ?? "The analysis failed.",
        );
      await new Promise((r) => setTimeout(r, POLL_MS));
    }
    throw new HttpError(
      503,
      "analysis_still_running",
      "The analysis is still running on another server; it will appear among the study's analyses when it finishes.",
    );
  }

  private hold(id: number): void {
    this.held.add(id);
    this.renewWhileHeld();
  }

  private release(id: number): void {
    this.held.delete(id);
    this.renewWhileHeld();
  }

  /** The heartbeat runs only while this instance holds runs. */
  private renewWhileHeld(): void {
    if (this.held.size > 0 && !this.heartbeat) {
      this.heartbeat = setInterval(() => void this.renew(), this.settings.renewMs);
      this.heartbeat.unref();
    } else if (this.held.size === 0 && this.heartbeat) {
      clearInterval(this.heartbeat);
      this.heartbeat = null;
    }
  }

  private async renew(): Promise<void> {
    const ids = [...this.held];
    try {
      const still = new Set(await renewLeases(this.ds, this.instanceId, ids, this.settings.leaseMs));
      // A run lost here still computes; its finishing write finds the claim gone and drops it.
      for (const id of ids) if (!still.has(id)) this.held.delete(id);
    } catch (e) {
      // The next beat tries again; the lease outlasts two missed beats.
      console.error(`renewing analysis run leases failed: ${e instanceof Error ? e.message : String(e)}`);
    }
  }
}

function logSweepError(e: unknown): void {
  console.error(`sweeping analysis runs failed: ${e instanceof Error ? e.message : String(e)}`);
}
