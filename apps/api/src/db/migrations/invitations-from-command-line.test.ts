import { describe, expect, it } from "vitest";
import { inviteWithLink } from "../../modules/invitations/invitation.service.js";
import { User } from "../../modules/users/user.entity.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { sql } from "../../test-support/sql.js";
import { toPublicUser } from "../../modules/users/user.entity.js";
import { InvitationsFromCommandLine1764950000000 } from "./1764950000000-invitations-from-command-line.js";

describe("migration 1764950000000: invitations without an inviting account", () => {
  it("keeps every row and id across down and up; down drops only the command-line invitations", async () => {
    const t = await makeTestApp();
    const admin = await t.ds.getRepository(User).findOneByOrFail({ role: "admin" });
    const byAdmin = await inviteWithLink(
      t.ds,
      { user: toPublicUser(admin), ip: null },
      { email: "by-admin@example.org", role: "analyst" },
      "http://localhost",
    );
    const byCli = await inviteWithLink(
      t.ds,
      "command line",
      { email: "by-cli@example.org", role: "admin" },
      "http://localhost",
    );
    const rows = () =>
      sql<{ id: number; email: string; invited_by_id: number | null }>(
        t.ds,
        `SELECT "id", "email", "invited_by_id" FROM "invitations" ORDER BY "id"`,
      );
    expect(byCli.invitation.invitedById).toBeNull();
    const migration = new InvitationsFromCommandLine1764950000000();
    const q = t.ds.createQueryRunner();
    try {
      await migration.down(q);
      expect(await rows()).toEqual([
        { id: byAdmin.invitation.id, email: "by-admin@example.org", invited_by_id: admin.id },
      ]);
      // NOT NULL again (SQLite and PostgreSQL word the refusal differently).
      await expect(
        q.query(
          `INSERT INTO "invitations" ("email", "role", "token_hash", "expires_at") VALUES ('x@example.org', 'admin', 'h', CURRENT_TIMESTAMP)`,
        ),
      ).rejects.toThrow(/not[- ]null/i);
      await migration.up(q);
      expect(await rows()).toEqual([
        { id: byAdmin.invitation.id, email: "by-admin@example.org", invited_by_id: admin.id },
      ]);
      const again = await inviteWithLink(
        t.ds,
        "command line",
        { email: "by-cli@example.org", role: "admin" },
        "http://localhost",
      );
      expect(again.invitation).toMatchObject({ invitedById: null, role: "admin", usedAt: null });
      expect((await rows()).map((r) => r.email)).toEqual(["by-admin@example.org", "by-cli@example.org"]);
    } finally {
      await q.release();
    }
  });
});
