import passport from "passport";
import { Strategy as LocalStrategy } from "passport-local";
import type { DataSource } from "typeorm";
import { User, toPublicUser } from "../modules/users/user.entity.js";
import { dummyHash, verifyPassword } from "./password.js";

/** The single message for any failed sign-in: it never says which of e-mail and password was wrong. */
export const WRONG_CREDENTIALS = "That e-mail and password do not match an account.";

/** Configures a passport instance for e-mail + password sign-in with the user id in the session. */
export function createPassport(ds: DataSource, bcryptCost: number): passport.PassportStatic {
  const pp = new passport.Passport() as unknown as passport.PassportStatic;
  const users = ds.getRepository(User);

  pp.use(
    new LocalStrategy({ usernameField: "email", passwordField: "password" }, (email, password, done) => {
      users
        .createQueryBuilder("u")
        .addSelect("u.passwordHash")
        .where("lower(u.email) = lower(:email)", { email })
        .getOne()
        .then(async (user) => {
          const ok = await verifyPassword(password, user?.passwordHash ?? (await dummyHash(bcryptCost)));
          if (!user || !ok) return done(null, false, { message: WRONG_CREDENTIALS });
          if (!user.active)
            return done(null, false, {
              message: "This account has been deactivated. Ask your admin to reactivate it.",
            });
          return done(null, toPublicUser(user));
        })
        .catch(done);
    }),
  );

  pp.serializeUser((user, done) => done(null, user.id));
  pp.deserializeUser((id: number, done) => {
    users
      .findOneBy({ id })
      .then((u) => done(null, u && u.active ? toPublicUser(u) : false))
      .catch(done);
  });
  return pp;
}
