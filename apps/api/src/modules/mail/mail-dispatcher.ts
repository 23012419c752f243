import nodemailer, { type Transporter } from "nodemailer";
import { LessThanOrEqual, type DataSource } from "typeorm";
import { recordAudit } from "../audit/audit.service.js";
import { OutboxMessage } from "./outbox-message.entity.js";

const MAX_ATTEMPTS = 5;
const BASE_DELAY_MS = 10_000;

/**
 * Sends queued messages through nodemailer's SMTP transport, retrying with exponential backoff;
 * after the last attempt the message is marked failed and the failure is audited.
 */
export class MailDispatcher {
  private transport: Transporter | null;
  private running: Promise<void> | null = null;
  private timer: NodeJS.Timeout | null = null;

  constructor(
    private readonly ds: DataSource,
    smtpUrl: string | null,
    private readonly from: string,
  ) {
    this.transport = smtpUrl ? nodemailer.createTransport(smtpUrl) : null;
  }

  start(intervalMs = 5000): void {
    this.timer = setInterval(() => void this.kick(), intervalMs);
    this.timer.unref();
  }

  stop(): void {
    if (this.timer) clearInterval(this.timer);
  }

  /** Sends what is due now; concurrent calls share one run. */
  kick(): Promise<void> {
    this.running ??= this.sendDue().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  private async sendDue(): Promise<void> {
    const repo = this.ds.getRepository(OutboxMessage);
    const due = await repo.find({
      where: { status: "pending", nextAttemptAt: LessThanOrEqual(new Date()) },
      order: { id: "ASC" },
      take: 50,
    });
    for (const m of due) {
      try {
        if (!this.transport) throw new Error("no SMTP_URL is configured");
        await this.transport.sendMail({
          from: this.from,
          to: m.to,
          subject: m.subject,
          text: m.text,
          html: m.html,
        });
        await repo.update(
          { id: m.id },
          { status: "sent", sentAt: new Date(), attempts: m.attempts + 1, lastError: null },
        );
      } catch (e) {
        const attempts = m.attempts + 1;
        const error = e instanceof Error ? e.message : String(e);
        const failed = attempts >= MAX_ATTEMPTS;
        await repo.update(
          { id: m.id },
          {
            attempts,
            lastError: error,
            status: failed ? "failed" : "pending",
            nextAttemptAt: new Date(Date.now() + BASE_DELAY_MS * 2 ** attempts),
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
  }
}
