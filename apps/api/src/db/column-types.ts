import type { ValueTransformer } from "typeorm";
import { processDatabaseDriver } from "../config/env.js";

/**
 * Column types kept behind one helper so the same entities map on SQLite and PostgreSQL. The
 * driver is fixed per process (see `processDatabaseDriver`), because decorators are evaluated once
 * when the entity modules load; `createDataSource` refuses a database of the other kind.
 */
export const ENTITY_DRIVER = processDatabaseDriver();
const pg = ENTITY_DRIVER === "postgres";

/** SQLite stores datetimes as UTC text; PostgreSQL as timestamptz (its long name). Both hydrate to a Date. */
export const DATETIME = pg ? ("timestamp with time zone" as const) : ("datetime" as const);
/** Uploaded file bytes. */
export const BLOB = pg ? ("bytea" as const) : ("blob" as const);
/** An 8-byte float: SQLite's real is one; PostgreSQL's real is 4 bytes, so double precision there. */
export const DOUBLE = pg ? ("double precision" as const) : ("real" as const);

/**
 * A bigint column read as a JS number. The pg client returns int8 as a string (it may exceed
 * 2^53); our values (epoch milliseconds) do not, so both drivers give the same number.
 */
export const BIGINT_AS_NUMBER: ValueTransformer = {
  to: (v: number | null | undefined) => v,
  from: (v: string | number | null) => (v === null || v === undefined ? v : Number(v)),
};
