import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import type { DataSource } from "typeorm";
import { ReceivedMessage } from "./received-message.entity.js";

/**
 * A local SMTP server for demo and test mode, on a loopback port: it accepts every message and
 * keeps it in the database for the dev mailbox. Nothing leaves the machine.
 */
export async function startFakeSmtpServer(
  ds: DataSource,
): Promise<{ url: string; close: () => Promise<void> }> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) =>
          ds.getRepository(ReceivedMessage).insert({
            to: (Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : []).map((a) => a.text).join(", "),
            from: mail.from?.text ?? "",
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : "",
            messageId: mail.messageId ?? null,
          }),
        )
        .then(() => callback())
        .catch((e: Error) => callback(e));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === "object" && address ? address.port : 0;
  return { url: `smtp://127.0.0.1:${port}`, close: () => new Promise((r) => server.close(() => r())) };
}
