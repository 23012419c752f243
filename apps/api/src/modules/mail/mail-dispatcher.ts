import { newInstanceId } from "../../lifecycle/instance-id.js";
import nodemailer, { type Transporter } from "nodemailer";
import { In, type DataSource } from "typeorm";
import { isPostgres } from "../../db/driver.js";
import { runSql } from "../../db/run-sql.js";
import { recordAudit } from "../audit/audit.service.js";
import { OutboxMessage } from "./outbox-message.entity.js";

const MAX_ATTEMPTS = 5;
const BASE_DELAY_MS = 10_000;
/** Messages claimed at a time: a small batch leaves the rest to other instances. */
const BATCH = 20;

/**
 * A stable Message-ID for an outbox row: if the process dies after the mail server accepted a
 * message but before the row was marked sent, the message is sent again with the same id, so
 * mail servers and readers can tell it is the same message. The creation time keeps ids apart
 * between databases whose row numbers coincide.
 */
export function outboxMessageId(m: Pick<OutboxMessage, "id" | "createdAt">, from: string): string {
  const domain = /@([^>\s]+)>?\s*$/.exec(from)?.[1] ?? "waymark.invalid";
  return `<outbox-${m.id}.${m.createdAt.getTime().toString(36)}@${domain}>`;
}

/**
 * Sends queued messages through nodemailer's SMTP transport, retrying with exponential backoff;
 * after the last attempt the message is marked failed and the failure is audited.
 *
 * Several API instances may share the outbox. Each claims a batch of due messages by writing its
 * id and a lease into the rows — with `FOR UPDATE SKIP LOCKED` on PostgreSQL, so two instances
 * never wait on or take the same rows; on SQLite the one writer makes the conditional UPDATE
 * enough — and renews the lease on each message just before sending it, skipping any it no
 * longer holds. A message whose instance died keeps its lease until it expires, then is claimed
 * again. Delivery is at least once: a crash between the mail server's acceptance and the "sent"
 * mark sends the message again, with the same Message-ID.
 */
export class MailDispatcher {
  /** Written into claimed rows: host, process and a random part, unique per dispatcher. */
  readonly instanceId = newInstanceId();
  private transport: Transporter | null;
  private running: Promise<void> | null = null;
  private timer: NodeJS.Timeout | null = null;
  private stopping = false;
  /** The message handed to the mail server right now, if any. */
  private sendingId: number | null = null;
  private readonly leaseMs: number;

  constructor(
    private readonly ds: DataSource,
    smtpUrl: string | null,
    private readonly from: string,
    opts: { leaseMs?: number } = {},
  ) {
    this.leaseMs = opts.leaseMs ?? 300_000;
    // One send must end well inside the lease, or another instance could take the message over
    // while it is still being sent: nodemailer's own defaults allow up to ten minutes.
    const bound = Math.max(1000, Math.floor(this.leaseMs / 4));
    this.transport = smtpUrl
      ? nodemailer.createTransport({
          url: smtpUrl,
          connectionTimeout: bound,
          greetingTimeout: bound,
          socketTimeout: bound,
        })
      : null;
  }

  start(intervalMs = 5000): void {
    // kick() never rejects, so the timer needs no handler of its own.
    this.timer = setInterval(() => void this.kick(), intervalMs);
    this.timer.unref();
  }

  /**
   * Stops the loop, lets the message being sent finish (waiting at most `waitMs`), and gives back
   * the claims not yet sent, so another instance sends them at once instead of after the lease.
   * A message still being sent after the wait keeps its claim: released, another instance could
   * send it at the same time; kept, it is sent again only if this one never marks it sent.
   */
  async stop(waitMs = 10_000): Promise<void> {
    this.stopping = true;
    if (this.timer) clearInterval(this.timer);
    let timer: NodeJS.Timeout | undefined;
    await Promise.race([this.running, new Promise((r) => (timer = setTimeout(r, waitMs)))]);
    clearTimeout(timer);
    await this.releaseClaims().catch((e: unknown) => this.report("giving back claims", e));
  }

  /**
   * Sends what is due now; concurrent calls share one run. Never rejects: a database error is
   * reported and the next run tries again (callers fire and forget).
   */
  kick(): Promise<void> {
    // Once stopping, nothing new starts; a caller still joins a send under way.
    if (this.stopping) return this.running ?? Promise.resolve();
    this.running ??= this.sendDue()
      .catch((e: unknown) => this.report("sending queued mail", e))
      .finally(() => {
        this.running = null;
      });
    return this.running;
  }

  private report(what: string, e: unknown): void {
    console.error(`Mail dispatcher: ${what} failed: ${e instanceof Error ? e.message : String(e)}`);
  }

  async releaseClaims(): Promise<number> {
    if (!this.ds.isInitialized) return 0;
    const { affected } = await runSql(
      this.ds,
      `UPDATE "mail_outbox" SET "claimed_by" = NULL, "lease_until" = NULL
       WHERE "claimed_by" = :me AND "status" = 'pending' AND "id" <> :sending`,
      { me: this.instanceId, sending: this.sendingId ?? 0 },
    );
    return affected;
  }

  /** Claims up to BATCH due messages nobody holds (or whose holder's lease has run out). */
  private async claim(): Promise<OutboxMessage[]> {
    const now = new Date();
    const { rows } = await runSql<{ id: number }>(
      this.ds,
      `UPDATE "mail_outbox" SET "claimed_by" = :me, "lease_until" = :lease
       WHERE "id" IN (
         SELECT "id" FROM "mail_outbox"
         WHERE "status" = 'pending' AND "next_attempt_at" <= :now
           AND ("lease_until" IS NULL OR "lease_until" <= :now)
         ORDER BY "id" LIMIT ${BATCH}${isPostgres(this.ds) ? " FOR UPDATE SKIP LOCKED" : ""}
       )
       RETURNING "id"`,
      { me: this.instanceId, lease: new Date(now.getTime() + this.leaseMs), now },
    );
    if (rows.length === 0) return [];
    return this.ds.getRepository(OutboxMessage).find({
      where: { id: In(rows.map((r) => Number(r.id))), claimedBy: this.instanceId },
      order: { id: "ASC" },
    });
  }

  /** Extends the lease on one message just before sending it; false if it is no longer ours. */
  private async renew(m: OutboxMessage): Promise<boolean> {
    const { affected } = await this.ds
      .getRepository(OutboxMessage)
      .update(
        { id: m.id, claimedBy: this.instanceId, status: "pending" },
        { leaseUntil: new Date(Date.now() + this.leaseMs) },
      );
    return affected === 1;
  }

  private async sendDue(): Promise<void> {
    const repo = this.ds.getRepository(OutboxMessage);
    for (;;) {
      if (this.stopping) return;
      const claimed = await this.claim();
      for (const m of claimed) {
        if (this.stopping) return; // the rest are given back by stop()
        if (!(await this.renew(m))) continue;
        this.sendingId = m.id;
        try {
          if (!this.transport) throw new Error("no SMTP_URL is configured");
          await this.transport.sendMail({
            from: this.from,
            to: m.to,
            subject: m.subject,
            text: m.text,
            html: m.html,
            messageId: outboxMessageId(m, this.from),
          });
        } catch (e) {
          await this.recordFailure(m, e);
          continue;
        } finally {
          this.sendingId = null;
        }
        // If this write fails the message keeps its claim and is sent again once the lease runs
        // out: at least once, never lost.
        await repo.update(
          { id: m.id, claimedBy: this.instanceId },
          { status: "sent", sentAt: new Date(), attempts: m.attempts + 1, lastError: null, leaseUntil: null },
        );
      }
      if (claimed.length < BATCH) return;
    }
  }

  private async recordFailure(m: OutboxMessage, e: unknown): Promise<void> {
    const attempts = m.attempts + 1;
    const error = e instanceof Error ? e.message : String(e);
    const failed = attempts >= MAX_ATTEMPTS;
    await this.ds.getRepository(OutboxMessage).update(
      { id: m.id, claimedBy: this.instanceId },
      {
        attempts,
        lastError: error,
        status: failed ? "failed" : "pending",
        nextAttemptAt: new Date(Date.now() + BASE_DELAY_MS * 2 ** attempts),
        claimedBy: null,
        leaseUntil: null,
      },
    );
    if (failed) {
      await recordAudit(
        this.ds,
        { user: null, ip: null },
        {
          action: "mail.failed",
          summary: `Gave up sending "${m.subject}" to ${m.to} after ${attempts} attempts: ${error}`,
        },
      );
    }
  }
}
