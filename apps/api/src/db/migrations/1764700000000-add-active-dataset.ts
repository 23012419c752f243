import type { MigrationInterface, QueryRunner } from "typeorm";

/** The data version a study analyses; null means the newest upload (every study before this migration). */
export class AddActiveDataset1764700000000 implements MigrationInterface {
  name = "AddActiveDataset1764700000000";

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE "studies" ADD COLUMN "active_dataset_id" integer REFERENCES "datasets" ("id")`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "studies" DROP COLUMN "active_dataset_id"`);
  }
}
