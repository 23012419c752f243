import type { RequestHandler } from "express";
import type passport from "passport";
import type { DataSource } from "typeorm";
import { CSRF_HEADER, generateToken } from "../../auth/csrf.js";
import { policy } from "../../auth/policy.js";
import { signInThrottle } from "../../auth/sign-in-throttle.js";
import type { Env } from "../../config/env.js";
import { WRONG_CREDENTIALS } from "../../auth/passport.js";
import { HttpError } from "../../http/errors.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { recordAudit } from "../audit/audit.service.js";
import type { TypeormSessionStore } from "../sessions/typeorm-session-store.js";
import { User, toPublicUser } from "../users/user.entity.js";
import { hashPassword, verifyPassword } from "../../auth/password.js";
import { passwordProblem } from "../../auth/password-policy.js";
import { reauth } from "../../auth/reauth-guard.js";
import { actorOf } from "../../http/actor.js";
import { loginSchema, passwordChangeSchema } from "./auth.schema.js";

export function authRoutes(
  pp: passport.PassportStatic,
  ds: DataSource,
  env: Env,
  sessions: TypeormSessionStore,
): RouteSpec[] {
  const throttle = signInThrottle(ds, {
    perAccount: env.SIGNIN_LIMIT_PER_ACCOUNT,
    perIp: env.SIGNIN_LIMIT_PER_IP,
  });
  const login: RequestHandler = (req, res, next) => {
    req.body = parseBody(loginSchema, req.body);
    pp.authenticate("local", (err: unknown, user: Express.User | false, info?: { message?: string }) => {
      if (err) return next(err);
      if (!user) {
        const email = (req.body as { email: string }).email;
        recordAudit(
          ds,
          { user: { id: null, email }, ip: req.ip ?? null },
          { action: "auth.sign-in-failed", summary: `Failed sign-in for ${email}` },
        )
          .then(() => next(new HttpError(401, "invalid_credentials", info?.message ?? WRONG_CREDENTIALS)))
          .catch(next);
        return;
      }
      // passport 0.7 regenerates the session id on login, which defeats session fixation; the
      // CSRF token is replaced too, so a token seen before sign-in is worthless after it.
      req.logIn(user, { session: true }, (e) => {
        if (e) return next(e);
        (req.session as unknown as { startedAt: number }).startedAt = Date.now();
        ds.getRepository(User)
          .update({ id: user.id }, { lastSignInAt: new Date() })
          .then(() =>
            recordAudit(
              ds,
              { user, ip: req.ip ?? null },
              { action: "auth.sign-in", summary: `Signed in as ${user.role}` },
            ),
          )
          .then(() => res.setHeader(CSRF_HEADER, generateToken(req, true)).json({ user }))
          .catch(next);
      });
    })(req, res, next);
  };

  const logout: RequestHandler = async (req, res, next) => {
    await recordAudit(
      ds,
      { user: req.user!, ip: req.ip ?? null },
      { action: "auth.sign-out", summary: "Signed out" },
    );
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy(() => {
        res.clearCookie("waymark.sid");
        res.status(204).end();
      });
    });
  };

  /** Changes the password and ends every session of the account, then signs this one in afresh. */
  const changePassword: RequestHandler = async (req, res, next) => {
    const body = parseBody(passwordChangeSchema, req.body);
    const users = ds.getRepository(User);
    const row = await users
      .createQueryBuilder("u")
      .addSelect("u.passwordHash")
      .where("u.id = :id", { id: req.user!.id })
      .getOneOrFail();
    const actor = actorOf(req);
    await reauth.check(ds, actor, "a password change");
    if (!(await verifyPassword(body.currentPassword, row.passwordHash))) {
      await reauth.failed(ds, actor, "a password change");
      throw new HttpError(403, "wrong_password", "currentPassword: That is not your current password.");
    }
    await reauth.succeeded(ds, actor);
    const problem = passwordProblem(body.newPassword, [row.email, row.displayName]);
    if (problem) throw new HttpError(400, "weak_password", `newPassword: ${problem}`);
    await users.update(
      { id: row.id },
      { passwordHash: await hashPassword(body.newPassword, env.BCRYPT_COST) },
    );
    await recordAudit(
      ds,
      { user: req.user!, ip: req.ip ?? null },
      { action: "user.password-changed", summary: "Changed their password; all sessions ended" },
    );
    await sessions.destroyForUser(row.id);
    req.logIn(toPublicUser(row), { session: true, keepSessionInfo: true }, (e) =>
      e ? next(e) : res.status(204).end(),
    );
  };

  const me: RequestHandler = (req, res) => {
    res.setHeader(CSRF_HEADER, generateToken(req));
    res.json({ user: req.user });
  };

  return [
    {
      method: "get",
      path: "/csrf",
      policy: policy.public,
      summary: "The session's CSRF token, to send as x-csrf-token on every change",
      handlers: [(req, res) => void res.json({ token: generateToken(req) })],
    },
    {
      method: "post",
      path: "/login",
      policy: policy.public,
      handlers: [...throttle, login],
      summary: "Sign in with e-mail and password",
    },
    { method: "post", path: "/logout", policy: policy.signedIn, handlers: [logout], summary: "Sign out" },
    { method: "get", path: "/me", policy: policy.signedIn, handlers: [me], summary: "The signed-in user" },
    {
      method: "put",
      path: "/password",
      policy: policy.signedIn,
      handlers: [changePassword],
      summary: "Change your password (ends all your sessions)",
    },
  ];
}
