import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import type { OmnibusTest } from "@waymark/stats";
import { DATETIME } from "../../../db/column-types.js";

export type RunStatus = "queued" | "running" | "done" | "failed";

/** What was asked for, as the request body gave it (already validated). */
export interface RunRequest {
  test?: OmnibusTest;
  justification?: string;
}

/**
 * One request to run the locked plan on a dataset version. An instance claims the row for a lease
 * it renews while the engine computes; when the lease lapses (the instance died) another instance
 * takes the run up. A run ends `done` with the one analysis it stored, or `failed` with the reason.
 */
@Entity({ name: "analysis_runs" })
export class AnalysisRun {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("integer", { name: "study_id" })
  studyId: number;

  @Column("integer", { name: "dataset_id" })
  datasetId: number;

  @Column("simple-json", { name: "request" })
  request: RunRequest;

  @Column("integer", { name: "requested_by_id" })
  requestedById: number;

  /** The requester's address, for the audit events the run writes. */
  @Column("varchar", { name: "requested_from_ip", length: 64, nullable: true })
  requestedFromIp: string | null;

  @Column("varchar", { length: 10 })
  status: RunStatus;

  /** The instance holding the run (host, process id and a random part), or null when none does. */
  @Column("varchar", { name: "claimed_by", length: 120, nullable: true })
  claimedBy: string | null;

  @Column({ name: "lease_until", type: DATETIME, nullable: true })
  leaseUntil: Date | null;

  /** Claims so far, counting the first; bounded by ANALYSIS_RUN_MAX_ATTEMPTS. */
  @Column("integer", { default: 0 })
  attempts: number;

  @Column("integer", { name: "analysis_id", nullable: true })
  analysisId: number | null;

  /** For a failed run: the HTTP status, code and message the request answers with. */
  @Column("integer", { name: "error_status", nullable: true })
  errorStatus: number | null;

  @Column("varchar", { name: "error_code", length: 60, nullable: true })
  errorCode: string | null;

  @Column("text", { name: "error_message", nullable: true })
  errorMessage: string | null;

  @CreateDateColumn({ name: "created_at", type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: "updated_at", type: DATETIME })
  updatedAt: Date;
}
