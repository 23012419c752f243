import request from "supertest";
import { describe, expect, it } from "vitest";
import { resetShutdownForTests, startDraining } from "../../lifecycle/shutdown.js";
import { makeTestApp } from "../../test-support/test-app.js";

describe("readiness and liveness", () => {
  it("is ready with its database; 503 while draining or without the database, while liveness stays 200", async () => {
    const t = await makeTestApp();
    try {
      const ready = await request(t.app).get("/api/ready").expect(200);
      expect(ready.body).toEqual({ status: "ready" });
      expect(ready.headers["cache-control"]).toBe("no-store");
      // Readiness, like health, makes no session.
      expect(ready.headers["set-cookie"]).toBeUndefined();

      startDraining();
      const draining = await request(t.app).get("/api/ready").expect(503);
      expect(draining.body.error.code).toBe("draining");
      await request(t.app).get("/api/health").expect(200);
      resetShutdownForTests();

      // The test app is closed after the file (close-apps.ts), which copes with a closed database.
      await t.ds.destroy();
      const noDb = await request(t.app).get("/api/ready").expect(503);
      expect(noDb.body.error).toEqual({
        code: "database_unreachable",
        message: "This instance cannot reach its database (no answer within 2 s).",
      });
      await request(t.app).get("/api/health").expect(200);
    } finally {
      resetShutdownForTests();
    }
  });
});
