import { CreateUsersAndSessions1764626400000 } from "./1764626400000-create-users-and-sessions.js";

/** Migrations in order; listed explicitly so they load the same from src (tsx) and dist. */
export const migrations = [CreateUsersAndSessions1764626400000];
