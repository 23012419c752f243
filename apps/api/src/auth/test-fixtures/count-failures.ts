import "reflect-metadata";
import { createDataSource } from "../../db/data-source.js";
import { DatabaseRateLimitStore } from "../sign-in-throttle-store.js";

/** A separate process hitting one counter `times` times, for the cross-process count test. */
const [databasePath, key, times] = process.argv.slice(2);
const ds = createDataSource(databasePath!);
await ds.initialize();
const store = new DatabaseRateLimitStore(ds, "test");
store.init({ windowMs: 60_000 } as Parameters<typeof store.init>[0]);
for (let i = 0; i < Number(times); i++) await store.increment(key!);
await ds.destroy();
