import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { DataSource } from "typeorm";
import { ENTITY_DRIVER } from "../db/column-types.js";
import { openDatabase } from "../db/data-source.js";
import { closeTestDatabase, openTestDatabase } from "./test-database.js";

/**
 * One database that several connections (standing in for several API instances or processes)
 * open together: a SQLite file in a temporary folder, or a fresh PostgreSQL test database.
 * `target` is what `openDatabase` and a child process take (the file path or the URL).
 */
export async function openSharedDatabase(): Promise<{
  target: string;
  connect: () => Promise<DataSource>;
  close: () => Promise<void>;
}> {
  const opened: DataSource[] = [];
  if (ENTITY_DRIVER === "postgres") {
    const { ds, url } = await openTestDatabase();
    return {
      target: url!,
      connect: async () => {
        const more = await openDatabase({
          driver: "postgres",
          url: url!,
          poolSize: 4,
          statementTimeoutMs: 60_000,
        });
        opened.push(more);
        return more;
      },
      close: async () => {
        for (const d of opened) if (d.isInitialized) await d.destroy();
        await closeTestDatabase(ds);
      },
    };
  }
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "waymark-shared-"));
  const file = path.join(dir, "shared.sqlite");
  return {
    target: file,
    connect: async () => {
      const ds = await openDatabase(file);
      opened.push(ds);
      return ds;
    },
    close: async () => {
      for (const d of opened) if (d.isInitialized) await d.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
