import type { MigrationInterface, QueryRunner } from "typeorm";
import { SIGNED_POSTHOC_TEXT } from "../../modules/analyses/posthoc-signed-text.js";
import { isPostgres } from "../driver.js";
import { pgRefuse } from "./by-driver.js";

const SQLITE_NO_UPDATE = `CREATE TRIGGER "trg_analyses_no_update" BEFORE UPDATE ON "analyses" BEGIN SELECT RAISE(ABORT, 'analyses rows are immutable'); END`;
const PG_NO_UPDATE = pgRefuse("trg_analyses_no_update", "UPDATE", "analyses", "analyses rows are immutable");

/**
 * Analyses stored their post-hoc family as display text ("Tukey–Kramer HSD"); records now keep
 * the vocabulary's ids ("tukey-kramer") and screens name them. Rows are immutable by trigger, so
 * the trigger is lifted for this one conversion and put back in the same transaction.
 */
export class PosthocMethodIds1764806400000 implements MigrationInterface {
  name = "PosthocMethodIds1764806400000";

  async up(q: QueryRunner): Promise<void> {
    await rename(q, (id, text) => [text, id]);
  }

  async down(q: QueryRunner): Promise<void> {
    await rename(q, (id, text) => [id, text]);
  }
}

/** Rewrites each `from` value to `to` with the immutability trigger lifted. */
async function rename(q: QueryRunner, pair: (id: string, text: string) => [from: string, to: string]) {
  const pg = isPostgres(q.connection);
  await q.query(`DROP TRIGGER IF EXISTS "trg_analyses_no_update"${pg ? ` ON "analyses"` : ""}`);
  const update = pg
    ? `UPDATE "analyses" SET "posthoc_method" = $1 WHERE "posthoc_method" = $2`
    : `UPDATE "analyses" SET "posthoc_method" = ? WHERE "posthoc_method" = ?`;
  for (const [id, text] of Object.entries(SIGNED_POSTHOC_TEXT)) {
    const [from, to] = pair(id, text);
    await q.query(update, [to, from]);
  }
  await q.query(pg ? PG_NO_UPDATE : SQLITE_NO_UPDATE);
}
