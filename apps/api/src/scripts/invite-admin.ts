import path from "node:path";
import { inviteBody } from "@waymark/contract";
import type { DataSource } from "typeorm";
import { loadEnv } from "../config/env.js";
import { openDatabase } from "../db/data-source.js";
import { HttpError } from "../http/errors.js";
import { inviteWithLink } from "../modules/invitations/invitation.service.js";
import { User } from "../modules/users/user.entity.js";

export const INVITE_ADMIN_USAGE = "Usage: npm run invite-admin -- <e-mail> [--another]";

/** A refusal worth one clear line to the operator; the command exits 1. */
export class InviteAdminRefused extends Error {}

/**
 * Creates an admin invitation from the command line: the way to the first admin account of a new
 * database outside demo mode, where people otherwise join only when an admin invites them.
 * Refuses a second admin unless `--another` is given, so a mistyped run on a live database does
 * not open an admin door unnoticed. The invitation is audited (as system), its e-mail queued in
 * the outbox like any invitation, and its one-time link returned for an operator without mail.
 */
export async function inviteAdmin(
  ds: DataSource,
  args: readonly string[],
  publicUrl: string,
): Promise<{ email: string; link: string; expiresAt: Date }> {
  const flags = args.filter((a) => a.startsWith("-"));
  const positional = args.filter((a) => !a.startsWith("-"));
  const unknown = flags.filter((f) => f !== "--another");
  if (unknown.length)
    throw new InviteAdminRefused(`unknown option ${unknown.join(", ")}. ${INVITE_ADMIN_USAGE}`);
  if (positional.length !== 1)
    throw new InviteAdminRefused(
      `${positional.length ? "give one e-mail address" : "no e-mail address given"}. ${INVITE_ADMIN_USAGE}`,
    );
  const parsed = inviteBody.safeParse({ email: positional[0], role: "admin" });
  if (!parsed.success)
    throw new InviteAdminRefused(`"${positional[0]}" is not a valid e-mail address. ${INVITE_ADMIN_USAGE}`);
  const admins = await ds.getRepository(User).countBy({ role: "admin", active: true });
  if (admins > 0 && !flags.includes("--another"))
    throw new InviteAdminRefused(
      `this database already has ${admins} active admin${admins === 1 ? "" : "s"}; they can invite people from the People page. To add another admin from the command line anyway, run again with --another.`,
    );
  try {
    const { invitation, link } = await inviteWithLink(ds, "command line", parsed.data, publicUrl);
    return { email: invitation.email, link, expiresAt: invitation.expiresAt };
  } catch (e) {
    // The service's refusal (the address already has an account) is the operator's to read.
    if (e instanceof HttpError) throw new InviteAdminRefused(e.message);
    throw e;
  }
}

async function main() {
  const env = loadEnv(undefined, { purpose: "script" });
  const ds = await openDatabase(env.database);
  try {
    const r = await inviteAdmin(ds, process.argv.slice(2), env.publicUrl);
    console.log(
      `Invited ${r.email} as admin. The invitation e-mail is queued and goes out when the server runs with mail configured.`,
    );
    console.log(`One-time link (valid until ${r.expiresAt.toISOString()}):`);
    console.log(r.link);
  } finally {
    await ds.destroy();
  }
}

if (process.argv[1] && import.meta.url.endsWith(path.basename(process.argv[1]))) {
  main().catch((e: unknown) => {
    const refused = e instanceof InviteAdminRefused;
    console.error(
      `invite-admin ${refused ? "refused" : "failed"}: ${e instanceof Error ? e.message : String(e)}`,
    );
    process.exit(1);
  });
}
