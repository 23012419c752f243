/**
 * Column types kept behind one helper so the same entities map on SQLite and PostgreSQL.
 * SQLite stores datetimes as text; PostgreSQL would use timestamptz.
 */
export const DATETIME = "datetime" as const;
