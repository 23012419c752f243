import type { DataSource } from "typeorm";
import type { Env } from "./config/env.js";
import { startFakeSmtpServer } from "./modules/mail/fake-smtp-server.js";
import { MailDispatcher } from "./modules/mail/mail-dispatcher.js";

/** Starts what the app needs besides the database: the mail dispatcher, and the fake SMTP server in demo/test. */
export async function startServices(ds: DataSource, env: Env) {
  const fake = env.fakeMail ? await startFakeSmtpServer(ds) : null;
  const mail = new MailDispatcher(ds, env.SMTP_URL ?? fake?.url ?? null, env.MAIL_FROM, {
    leaseMs: env.MAIL_LEASE_SECONDS * 1000,
  });
  mail.start(env.fakeMail ? 2000 : 10_000);
  return {
    mail,
    /** Stops the dispatcher (giving back its unsent claims) and the fake mail server. */
    async stop() {
      await mail.stop();
      await fake?.close();
    },
  };
}
