import { Table, TableIndex, type MigrationInterface, type QueryRunner } from "typeorm";
import { isPostgres } from "../driver.js";

/** The driver's datetime type (the entities' `DATETIME`), asked of the connection being migrated. */
const datetime = (q: QueryRunner) => (isPostgres(q.connection) ? "timestamp with time zone" : "datetime");

/**
 * Failed sign-in counters, shared by every API instance on the database: one row per counted key
 * (an address or an account) with its hits in the current window and when that window ends.
 * Written with TypeORM's portable table API, so the same file serves SQLite and PostgreSQL.
 */
export class CreateSignInThrottle1764900000000 implements MigrationInterface {
  name = "CreateSignInThrottle1764900000000";

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: "sign_in_throttle",
        columns: [
          { name: "key", type: "varchar", length: "300", isPrimary: true },
          { name: "hits", type: "integer", isNullable: false },
          { name: "reset_at", type: datetime(q), isNullable: false },
        ],
      }),
    );
    await q.createIndex(
      "sign_in_throttle",
      new TableIndex({ name: "idx_sign_in_throttle_reset_at", columnNames: ["reset_at"] }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable("sign_in_throttle");
  }
}
