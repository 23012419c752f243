import bcrypt from "bcryptjs";

/** bcrypt (Provos & Mazières 1999): a deliberately slow, salted hash. */
export function hashPassword(plain: string, cost: number): Promise<string> {
  return bcrypt.hash(plain, cost);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}

let dummy: Promise<string> | undefined;

/**
 * A real hash at the configured cost, compared against when the e-mail is unknown,
 * so the response time does not tell which of e-mail and password was wrong.
 */
export function dummyHash(cost: number): Promise<string> {
  dummy ??= bcrypt.hash("no-such-account-placeholder", cost);
  return dummy;
}
