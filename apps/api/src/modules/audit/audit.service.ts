import type { DataSource, EntityManager } from "typeorm";
import type { Actor } from "../../http/actor.js";
import { AuditEvent } from "./audit-event.entity.js";
import type { AuditAction } from "./audit-actions.js";

export interface AuditEntry {
  action: AuditAction;
  summary: string;
  studyId?: number | null;
  before?: object | null;
  after?: object | null;
}

/**
 * Appends one event. Pass the transaction's manager so the event commits or rolls back with
 * the change it describes. `actor` may be a bare identity for events without a session
 * (a failed sign-in).
 */
export async function recordAudit(
  db: DataSource | EntityManager,
  actor: Actor | { user: { id: number | null; email: string | null } | null; ip: string | null },
  e: AuditEntry,
): Promise<void> {
  const row: Partial<AuditEvent> = {
    actorId: actor.user?.id ?? null,
    actorEmail: actor.user?.email ?? null,
    action: e.action,
    studyId: e.studyId ?? null,
    ip: actor.ip,
    summary: e.summary,
    before: (e.before ?? null) as Record<string, unknown> | null,
    after: (e.after ?? null) as Record<string, unknown> | null,
  };
  // simple-json columns defeat TypeORM's insert typing; the shape is checked by Partial<AuditEvent>.
  await db.getRepository(AuditEvent).insert(row as never);
}
