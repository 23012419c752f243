import { SMTPServer } from "smtp-server";
import type { DataSource } from "typeorm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { openSharedDatabase } from "../../test-support/shared-database.js";
import { startFakeSmtpServer } from "./fake-smtp-server.js";
import { MailDispatcher, outboxMessageId } from "./mail-dispatcher.js";
import { enqueueMail } from "./outbox.js";
import { OutboxMessage } from "./outbox-message.entity.js";
import { ReceivedMessage } from "./received-message.entity.js";

const FROM = "Waymark <no-reply@waymark.test>";

let shared: Awaited<ReturnType<typeof openSharedDatabase>>;
/** Two connections to one database: two API instances, as far as the outbox can tell. */
let a: DataSource;
let b: DataSource;
let smtp: Awaited<ReturnType<typeof startFakeSmtpServer>>;

beforeAll(async () => {
  shared = await openSharedDatabase();
  a = await shared.connect();
  b = await shared.connect();
  smtp = await startFakeSmtpServer(a);
});
afterAll(async () => {
  await smtp.close();
  await shared.close();
});
beforeEach(async () => {
  await a.getRepository(OutboxMessage).clear();
  await a.getRepository(ReceivedMessage).clear();
});

async function enqueue(n: number, tag: string): Promise<void> {
  for (let i = 0; i < n; i++)
    await enqueueMail(a.manager, {
      to: `p${i}@waymark.test`,
      subject: `${tag} ${i}`,
      text: "t",
      html: "<p>t</p>",
    });
}
const outbox = () => a.getRepository(OutboxMessage).find({ order: { id: "ASC" } });
const received = () => a.getRepository(ReceivedMessage).find({ order: { id: "ASC" } });

describe("the mail outbox shared by several instances", () => {
  it("sends every message exactly once when two dispatchers run at the same time, each with its stable Message-ID", async () => {
    await enqueue(45, "shared");
    const one = new MailDispatcher(a, smtp.url, FROM);
    const two = new MailDispatcher(b, smtp.url, FROM);
    await Promise.all([one.kick(), two.kick(), one.kick(), two.kick()]);
    const rows = await outbox();
    expect(rows.map((r) => r.status)).toEqual(Array(45).fill("sent"));
    expect(rows.every((r) => r.leaseUntil === null && r.attempts === 1)).toBe(true);
    // Both instances took part (each claims 20 at a time), and each row names the one that sent it.
    expect(new Set(rows.map((r) => r.claimedBy))).toEqual(new Set([one.instanceId, two.instanceId]));
    const got = await received();
    expect(got).toHaveLength(45);
    expect(got.map((m) => m.messageId).sort()).toEqual(rows.map((r) => outboxMessageId(r, FROM)).sort());
  });

  it("leaves a message another instance holds alone until its lease runs out, then sends it", async () => {
    await enqueue(2, "leased");
    const [held, expired] = await outbox();
    const repo = a.getRepository(OutboxMessage);
    await repo.update(held!.id, { claimedBy: "gone:1", leaseUntil: new Date(Date.now() + 400) });
    await repo.update(expired!.id, { claimedBy: "gone:1", leaseUntil: new Date(Date.now() - 1) });
    const survivor = new MailDispatcher(b, smtp.url, FROM);
    await survivor.kick();
    expect((await received()).map((m) => m.subject)).toEqual(["leased 1"]);
    await new Promise((r) => setTimeout(r, 450));
    await survivor.kick();
    expect((await received()).map((m) => m.subject)).toEqual(["leased 1", "leased 0"]);
    expect((await outbox()).map((r) => [r.status, r.claimedBy])).toEqual([
      ["sent", survivor.instanceId],
      ["sent", survivor.instanceId],
    ]);
  });

  it("re-sends a message whose instance died after the mail server took it, with the same Message-ID", async () => {
    await enqueue(1, "crash");
    const dead = new MailDispatcher(a, smtp.url, FROM);
    await dead.kick();
    // As if the process had died between the server's acceptance and the "sent" mark, long enough ago.
    const [row] = await outbox();
    await a
      .getRepository(OutboxMessage)
      .update(row!.id, { status: "pending", sentAt: null, leaseUntil: new Date(Date.now() - 1) });
    const survivor = new MailDispatcher(b, smtp.url, FROM);
    await survivor.kick();
    const got = await received();
    expect(got).toHaveLength(2);
    expect(new Set(got.map((m) => m.messageId))).toEqual(new Set([outboxMessageId(row!, FROM)]));
  });

  it("on stop, finishes the message being sent and gives back the rest of its claims", async () => {
    const slow = await slowMailServer(300);
    try {
      await enqueue(3, "stop");
      const leaving = new MailDispatcher(a, slow.url, FROM);
      const run = leaving.kick();
      await slow.firstMessageArrives;
      await leaving.stop();
      await run;
      expect(slow.accepted).toEqual(["stop 0"]);
      expect((await outbox()).map((r) => [r.subject, r.status, r.claimedBy, r.leaseUntil])).toEqual([
        ["stop 0", "sent", leaving.instanceId, null],
        ["stop 1", "pending", null, null],
        ["stop 2", "pending", null, null],
      ]);
      // Another instance sends the given-back messages at once, without waiting for a lease.
      const other = new MailDispatcher(b, smtp.url, FROM);
      await other.kick();
      expect((await received()).map((m) => m.subject)).toEqual(["stop 1", "stop 2"]);
      // A stopped dispatcher claims nothing more.
      await enqueue(1, "after");
      await leaving.kick();
      expect(await a.getRepository(OutboxMessage).countBy({ status: "pending" })).toBe(1);
    } finally {
      await slow.close();
    }
  });

  it("stops waiting for a send that takes too long, keeping that one message's claim", async () => {
    const slow = await slowMailServer(1500);
    try {
      await enqueue(2, "hung");
      const leaving = new MailDispatcher(a, slow.url, FROM);
      const run = leaving.kick();
      await slow.firstMessageArrives;
      await leaving.stop(100);
      // Given back, the message being sent could go out from two instances at once: it stays claimed.
      expect((await outbox()).map((r) => [r.subject, r.status, r.claimedBy])).toEqual([
        ["hung 0", "pending", leaving.instanceId],
        ["hung 1", "pending", null],
      ]);
      await run;
      expect((await outbox()).map((r) => [r.subject, r.status])).toEqual([
        ["hung 0", "sent"],
        ["hung 1", "pending"],
      ]);
    } finally {
      await slow.close();
    }
  });
});

/** A mail server that takes `delayMs` to accept each message, so a stop can land mid-send. */
async function slowMailServer(delayMs: number) {
  const accepted: string[] = [];
  let receiving = () => {};
  const firstMessageArrives = new Promise<void>((r) => (receiving = r));
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      let body = "";
      receiving();
      stream.on("data", (c: Buffer) => (body += c.toString()));
      stream.on("end", () =>
        setTimeout(() => {
          accepted.push(/^Subject: (.*)$/m.exec(body)?.[1] ?? "");
          callback();
        }, delayMs),
      );
    },
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", () => r()));
  const { port } = server.server.address() as { port: number };
  return {
    url: `smtp://127.0.0.1:${port}`,
    accepted,
    firstMessageArrives,
    close: () => new Promise<void>((r) => server.close(() => r())),
  };
}
