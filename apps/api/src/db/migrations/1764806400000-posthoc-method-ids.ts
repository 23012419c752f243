import type { MigrationInterface, QueryRunner } from "typeorm";
import { SIGNED_POSTHOC_TEXT } from "../../modules/analyses/posthoc-signed-text.js";

const NO_UPDATE = `CREATE TRIGGER "trg_analyses_no_update" BEFORE UPDATE ON "analyses" BEGIN SELECT RAISE(ABORT, 'analyses rows are immutable'); END`;

/**
 * Analyses stored their post-hoc family as display text ("Tukey–Kramer HSD"); records now keep
 * the vocabulary's ids ("tukey-kramer") and screens name them. Rows are immutable by trigger, so
 * the trigger is lifted for this one conversion and put back in the same transaction.
 */
export class PosthocMethodIds1764806400000 implements MigrationInterface {
  name = "PosthocMethodIds1764806400000";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`DROP TRIGGER IF EXISTS "trg_analyses_no_update"`);
    for (const [id, text] of Object.entries(SIGNED_POSTHOC_TEXT))
      await q.query(`UPDATE "analyses" SET "posthoc_method" = ? WHERE "posthoc_method" = ?`, [id, text]);
    await q.query(NO_UPDATE);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TRIGGER IF EXISTS "trg_analyses_no_update"`);
    for (const [id, text] of Object.entries(SIGNED_POSTHOC_TEXT))
      await q.query(`UPDATE "analyses" SET "posthoc_method" = ? WHERE "posthoc_method" = ?`, [text, id]);
    await q.query(NO_UPDATE);
  }
}
