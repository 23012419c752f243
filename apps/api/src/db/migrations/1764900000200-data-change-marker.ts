import type { MigrationInterface, QueryRunner } from "typeorm";
import { isPostgres } from "../driver.js";
import { runForDriver } from "./by-driver.js";

/**
 * The tables whose rows the studies list and the study page show (study-list-records.ts, the
 * status records, the presenters), with the columns whose change matters when only some do.
 * Every write to them moves the one-row change marker, which the response cache keys on.
 */
export const MARKED_TABLES: ReadonlyArray<{ table: string; updateOf?: string[] }> = [
  { table: "studies" },
  { table: "datasets" },
  { table: "analyses" },
  { table: "review_rounds" },
  { table: "review_comments" },
  { table: "review_replies" },
  // Sign-ins write last_sign_in_at; only a name or role change shows.
  { table: "users", updateOf: ["display_name", "role"] },
];

const EVENTS = ["insert", "update", "delete"] as const;
const BUMP = `UPDATE "data_changes" SET "version" = "version" + 1 WHERE "id" = 1`;

const when = (event: (typeof EVENTS)[number], updateOf?: string[]) =>
  event === "update" && updateOf
    ? `UPDATE OF ${updateOf.map((c) => `"${c}"`).join(", ")}`
    : event.toUpperCase();

const tableSql = (BIG: string) => [
  `CREATE TABLE "data_changes" ("id" integer PRIMARY KEY CHECK ("id" = 1), "version" ${BIG} NOT NULL)`,
  `INSERT INTO "data_changes" ("id", "version") VALUES (1, 0)`,
];

/**
 * A change marker held by the database, so every API instance on it sees a write at once,
 * including writes made outside the app. On PostgreSQL the bump is a deferred constraint trigger:
 * it runs at commit, so the marker row is locked only for the moment before a transaction ends
 * (never while it waits for another lock, which could deadlock), and readers see the new marker
 * exactly when they can see the rows it covers.
 */
export class DataChangeMarker1764900000200 implements MigrationInterface {
  name = "DataChangeMarker1764900000200";

  async up(q: QueryRunner): Promise<void> {
    await runForDriver(q, {
      sqlite: [
        ...tableSql("integer"),
        ...MARKED_TABLES.flatMap(({ table, updateOf }) =>
          EVENTS.map(
            (e) =>
              `CREATE TRIGGER "trg_${table}_changed_${e}" AFTER ${when(e, updateOf)} ON "${table}" BEGIN ${BUMP}; END`,
          ),
        ),
      ],
      postgres: [
        ...tableSql("bigint"),
        `CREATE OR REPLACE FUNCTION "waymark_note_change"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  ${BUMP};
  RETURN NULL;
END
$$`,
        ...MARKED_TABLES.flatMap(({ table, updateOf }) => [
          ...EVENTS.map(
            (e) =>
              `CREATE CONSTRAINT TRIGGER "trg_${table}_changed_${e}" AFTER ${when(e, updateOf)} ON "${table}" DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION "waymark_note_change"()`,
          ),
          `CREATE TRIGGER "trg_${table}_changed_truncate" AFTER TRUNCATE ON "${table}" FOR EACH STATEMENT EXECUTE FUNCTION "waymark_note_change"()`,
        ]),
      ],
    });
  }

  async down(q: QueryRunner): Promise<void> {
    for (const { table } of MARKED_TABLES)
      for (const e of [...EVENTS, "truncate"])
        await q.query(
          `DROP TRIGGER IF EXISTS "trg_${table}_changed_${e}"${isPostgres(q.connection) ? ` ON "${table}"` : ""}`,
        );
    await q.query(`DROP TABLE "data_changes"`);
  }
}
