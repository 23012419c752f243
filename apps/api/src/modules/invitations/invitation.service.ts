import { createHash, randomBytes } from "node:crypto";
import { IsNull, type DataSource } from "typeorm";
import { hashPassword } from "../../auth/password.js";
import { passwordProblem } from "../../auth/password-policy.js";
import type { Role } from "../../auth/roles.js";
import type { Actor } from "../../http/actor.js";
import { ConflictError, HttpError } from "../../http/errors.js";
import { recordAudit } from "../audit/audit.service.js";
import { invitationMessage } from "../mail/messages.js";
import { enqueueMail } from "../mail/outbox.js";
import { toPublicUser, User, type PublicUser } from "../users/user.entity.js";
import { Invitation } from "./invitation.entity.js";
import { lockRowForWrite } from "../../db/row-lock.js";
import { inTransaction } from "../../db/in-transaction.js";

export const INVITATION_HOURS = 72;

export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

import type { InvitationState } from "@waymark/contract";
export type { InvitationState };

export function stateOf(i: Invitation, now = Date.now()): InvitationState {
  if (i.usedAt) return "used";
  if (i.revokedAt) return "revoked";
  if (new Date(i.expiresAt).getTime() <= now) return "expired";
  return "open";
}

/**
 * Who invites: a signed-in admin, or the operator at the command line (`npm run invite-admin`,
 * for the first admin of a new database), who has no account; the audit trail shows it as system.
 */
export type Inviter = Actor | "command line";

/** The inviter as the e-mail names them. */
const COMMAND_LINE_INVITER = { displayName: "The administrator of this Waymark", email: "" };

/**
 * Invites a person with a role; re-inviting the same address revokes the earlier link. Returns
 * the invitation and its one-time link (only its hash is stored).
 */
export async function inviteWithLink(
  ds: DataSource,
  inviter: Inviter,
  input: { email: string; role: Role },
  baseUrl: string,
): Promise<{ invitation: Invitation; link: string }> {
  const byCommandLine = inviter === "command line";
  const email = input.email.toLowerCase();
  if (
    await ds
      .getRepository(User)
      .createQueryBuilder("u")
      .where("lower(u.email) = :email", { email })
      .getExists()
  ) {
    throw new ConflictError(`${email} already has an account.`);
  }
  const token = randomBytes(32).toString("base64url");
  const link = `${baseUrl}/invite/${token}`;
  const id = await inTransaction(ds, async (tx) => {
    const repo = tx.getRepository(Invitation);
    await repo.update({ email, usedAt: IsNull(), revokedAt: IsNull() }, { revokedAt: new Date() });
    const saved = await repo.save(
      repo.create({
        email,
        role: input.role,
        tokenHash: hashToken(token),
        expiresAt: new Date(Date.now() + INVITATION_HOURS * 3600_000),
        invitedById: byCommandLine ? null : inviter.user.id,
        usedAt: null,
        revokedAt: null,
      }),
    );
    await recordAudit(tx, byCommandLine ? { user: null, ip: null } : inviter, {
      action: "invitation.sent",
      summary: `Invited ${email} as ${input.role}${byCommandLine ? " from the command line" : ""}`,
      after: {
        email,
        role: input.role,
        invitationId: saved.id,
        ...(byCommandLine && { via: "command line" }),
      },
    });
    await enqueueMail(
      tx,
      invitationMessage(email, input.role, byCommandLine ? COMMAND_LINE_INVITER : inviter.user, link),
    );
    return saved.id;
  });
  return { invitation: await ds.getRepository(Invitation).findOneByOrFail({ id }), link };
}

/** Invites a person with a role from a signed-in admin's request. */
export async function invite(
  ds: DataSource,
  actor: Actor,
  input: { email: string; role: Role },
  baseUrl: string,
): Promise<Invitation> {
  return (await inviteWithLink(ds, actor, input, baseUrl)).invitation;
}

/** Looks up an invitation by its token, with a message for each way it may no longer work. */
export async function findByToken(ds: DataSource, token: string): Promise<Invitation> {
  const inv = await ds.getRepository(Invitation).findOneBy({ tokenHash: hashToken(token) });
  if (!inv)
    throw new HttpError(
      404,
      "invitation_not_found",
      "This invitation link is not valid. Ask your admin for a new one.",
    );
  const state = stateOf(inv);
  if (state === "used")
    throw new HttpError(
      410,
      "invitation_used",
      "This invitation has already been used. Sign in with the account it created.",
    );
  if (state === "revoked")
    throw new HttpError(
      410,
      "invitation_revoked",
      "This invitation was replaced by a newer one. Use the link in the latest e-mail.",
    );
  if (state === "expired")
    throw new HttpError(
      410,
      "invitation_expired",
      `This invitation expired (links last ${INVITATION_HOURS} hours). Ask your admin to invite you again.`,
    );
  return inv;
}

/** Creates the invited account and marks the token used, in one transaction. */
export async function acceptInvitation(
  ds: DataSource,
  token: string,
  input: { displayName: string; password: string },
  cost: number,
  ip: string | null,
): Promise<PublicUser> {
  const inv = await findByToken(ds, token);
  const problem = passwordProblem(input.password, [inv.email, input.displayName]);
  if (problem) throw new HttpError(400, "weak_password", `password: ${problem}`);
  const passwordHash = await hashPassword(input.password, cost);
  return inTransaction(ds, async (tx) => {
    // Re-check inside the transaction so two tabs cannot both use one token.
    await lockRowForWrite(tx, "invitations", inv.id);
    const fresh = await tx.getRepository(Invitation).findOneByOrFail({ id: inv.id });
    if (stateOf(fresh) !== "open")
      throw new HttpError(410, "invitation_used", "This invitation has already been used.");
    const saved = await tx.getRepository(User).save(
      tx.getRepository(User).create({
        email: inv.email,
        displayName: input.displayName,
        role: inv.role,
        passwordHash,
        active: true,
      }),
    );
    await tx.getRepository(Invitation).update({ id: inv.id }, { usedAt: new Date() });
    const user = toPublicUser(saved);
    await recordAudit(
      tx,
      { user, ip },
      {
        action: "invitation.accepted",
        summary: `Accepted the invitation as ${inv.role}`,
        after: { userId: user.id, role: inv.role },
      },
    );
    return user;
  });
}
