import type { EntityManager } from "typeorm";
import { OutboxMessage } from "./outbox-message.entity.js";

export interface MailContent {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/**
 * Queues a message inside the caller's transaction: the action never waits for, or fails
 * because of, the mail server. The dispatcher sends it and retries on failure.
 */
export async function enqueueMail(tx: EntityManager, m: MailContent): Promise<void> {
  await tx.getRepository(OutboxMessage).insert({
    ...m,
    status: "pending",
    attempts: 0,
    nextAttemptAt: new Date(),
    lastError: null,
    sentAt: null,
    claimedBy: null,
    leaseUntil: null,
  });
}
