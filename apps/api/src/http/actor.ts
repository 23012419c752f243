import type { Request } from "express";
import { UnauthenticatedError } from "./errors.js";

/** Who is acting and from where: what services need for rules and the audit trail. */
export interface Actor {
  user: Express.User;
  ip: string | null;
}

export function actorOf(req: Request): Actor {
  if (!req.user) throw new UnauthenticatedError();
  return { user: req.user, ip: req.ip ?? null };
}
