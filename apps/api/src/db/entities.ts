import { Session } from "../modules/sessions/session.entity.js";
import { User } from "../modules/users/user.entity.js";

/** Every entity, listed once: the data source and the tests both read this. */
export const entities = [User, Session];
