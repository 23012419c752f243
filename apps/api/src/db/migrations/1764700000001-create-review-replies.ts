import type { MigrationInterface, QueryRunner } from "typeorm";

/** The analyst's replies to reviewer comments, one thread per comment. */
export class CreateReviewReplies1764700000001 implements MigrationInterface {
  name = "CreateReviewReplies1764700000001";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "review_replies" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "comment_id" integer NOT NULL REFERENCES "review_comments" ("id"),
      "body" text NOT NULL,
      "author_id" integer NOT NULL REFERENCES "users" ("id"),
      "created_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE INDEX "idx_review_replies_comment" ON "review_replies" ("comment_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "review_replies"`);
  }
}
