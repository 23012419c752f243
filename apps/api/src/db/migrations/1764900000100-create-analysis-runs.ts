import { Table, TableIndex, type MigrationInterface, type QueryRunner } from "typeorm";
import { isPostgres } from "../driver.js";

/** The driver's datetime type (the entities' `DATETIME`), asked of the connection being migrated. */
const datetime = (q: QueryRunner) => (isPostgres(q.connection) ? "timestamp with time zone" : "datetime");

/**
 * Analysis runs as rows an instance claims with a lease, so a run outlives the instance that took
 * it. Written with TypeORM's portable Table API: the same schema and names on SQLite and PostgreSQL.
 */
export class CreateAnalysisRuns1764900000100 implements MigrationInterface {
  name = "CreateAnalysisRuns1764900000100";

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: "analysis_runs",
        columns: [
          {
            name: "id",
            type: "integer",
            isPrimary: true,
            isGenerated: true,
            generationStrategy: "increment",
          },
          { name: "study_id", type: "integer" },
          { name: "dataset_id", type: "integer" },
          { name: "request", type: "text" },
          { name: "requested_by_id", type: "integer" },
          { name: "requested_from_ip", type: "varchar", length: "64", isNullable: true },
          { name: "status", type: "varchar", length: "10" },
          { name: "claimed_by", type: "varchar", length: "120", isNullable: true },
          { name: "lease_until", type: datetime(q), isNullable: true },
          { name: "attempts", type: "integer", default: 0 },
          { name: "analysis_id", type: "integer", isNullable: true },
          { name: "error_status", type: "integer", isNullable: true },
          { name: "error_code", type: "varchar", length: "60", isNullable: true },
          { name: "error_message", type: "text", isNullable: true },
          { name: "created_at", type: datetime(q), default: "CURRENT_TIMESTAMP" },
          { name: "updated_at", type: datetime(q), default: "CURRENT_TIMESTAMP" },
        ],
        foreignKeys: [
          { columnNames: ["study_id"], referencedTableName: "studies", referencedColumnNames: ["id"] },
          { columnNames: ["dataset_id"], referencedTableName: "datasets", referencedColumnNames: ["id"] },
          { columnNames: ["requested_by_id"], referencedTableName: "users", referencedColumnNames: ["id"] },
          { columnNames: ["analysis_id"], referencedTableName: "analyses", referencedColumnNames: ["id"] },
        ],
      }),
    );
    // What every sweep asks: runs waiting, or running with a lapsed lease.
    await q.createIndex(
      "analysis_runs",
      new TableIndex({ name: "idx_analysis_runs_due", columnNames: ["status", "lease_until"] }),
    );
    // One analysis per run, held by the database as well as by the conditional finish.
    await q.createIndex(
      "analysis_runs",
      new TableIndex({ name: "uq_analysis_runs_analysis", columnNames: ["analysis_id"], isUnique: true }),
    );
    await q.createIndex(
      "analysis_runs",
      new TableIndex({ name: "idx_analysis_runs_study", columnNames: ["study_id"] }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable("analysis_runs");
  }
}
