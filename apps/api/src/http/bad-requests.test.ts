import http from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../test-support/agents.js";
import { lockedStudy } from "../test-support/locked-study.js";
import { makeTestApp } from "../test-support/test-app.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let studyId: number;
beforeAll(async () => {
  t = await makeTestApp({ uploadLimitMb: 5 });
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  studyId = await lockedStudy(analyst);
});
afterAll(async () => t.services.stop());

const CSV = "Line,Yield (g)\nNorth,1\nNorth,2\nSouth,3\nSouth,4\nEast,5\nEast,6\n";

/** Sends raw bytes as an upload through a real socket, for bodies supertest will not build. */
async function rawUpload(contentType: string, body: string, declaredLength?: number) {
  const server = t.app.listen(0);
  await new Promise((r) => server.once("listening", r));
  const { port } = server.address() as AddressInfo;
  const cookie = (
    analyst as unknown as { jar: { getCookies: (o: unknown) => { toValueString(): string }[] } }
  ).jar
    .getCookies({ domain: "127.0.0.1", path: "/", secure: false, script: false })
    .map((c) => c.toValueString())
    .join("; ");
  const token = (await analyst.get("/api/auth/me")).headers["x-csrf-token"] as string;
  try {
    return await new Promise<{ status: number; body: { error?: { code: string; message: string } } }>(
      (resolve, reject) => {
        const req = http.request(
          {
            port,
            method: "POST",
            path: `/api/studies/${studyId}/datasets`,
            headers: {
              "content-type": contentType,
              "content-length": declaredLength ?? Buffer.byteLength(body),
              cookie,
              "x-csrf-token": token,
            },
          },
          (res) => {
            let text = "";
            res.on("data", (c) => (text += c));
            res.on("end", () => resolve({ status: res.statusCode!, body: JSON.parse(text || "{}") }));
          },
        );
        req.on("error", reject);
        req.write(body);
        // A truncated body: the client stops sending before the declared length, then closes.
        if (declaredLength && declaredLength > Buffer.byteLength(body))
          setTimeout(() => req.socket?.end(), 50);
        else req.end();
      },
    );
  } finally {
    server.close();
  }
}

describe("bad requests get a 4xx in the one error shape, never a 500", () => {
  it("multipart without a boundary → 400", async () => {
    const res = await rawUpload("multipart/form-data", "--x\r\n");
    expect(res.status).toBe(400);
    expect(res.body.error?.message).toMatch(/upload could not be read.*[Bb]oundary/);
  });

  it("a malformed part header → 400", async () => {
    const body = "--B\r\nContent-Disposition form-data name=file\r\n\r\nx\r\n--B--\r\n";
    const res = await rawUpload("multipart/form-data; boundary=B", body);
    expect(res.status).toBe(400);
    expect(res.body.error?.code).toMatch(/bad_upload|file_missing/);
  });

  it("a multipart body that ends early → 400", async () => {
    const body = `--B\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\nContent-Type: text/csv\r\n\r\n${CSV}`;
    const res = await rawUpload("multipart/form-data; boundary=B", body);
    expect(res.status).toBe(400);
    expect(res.body.error?.message).toMatch(/upload could not be read/);
  });

  it("% and %FF in a path id → 400, not 500", async () => {
    for (const p of ["/api/studies/%", "/api/studies/%FF", "/api/studies/1/datasets/%E0%A4%A/checks"]) {
      const res = await analyst.get(p);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("bad_address");
    }
  });

  it("non-numeric ids are refused before any query runs", async () => {
    for (const id of ["abc", "NaN", "1e3", "-1", "0", "99999999999", "1.5"]) {
      const res = await analyst.get(`/api/studies/${id}`);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("invalid_id");
    }
    expect((await analyst.get(`/api/studies/${studyId}/datasets/abc/checks`)).status).toBe(400);
  });

  it("statistics input errors from the power calculator are 422, naming the problem", async () => {
    const tiny = await analyst.post("/api/power").send({ k: 3, effectF: 1e-6, alpha: 0.05, power: 0.8 });
    expect(tiny.status).toBe(422);
    expect(tiny.body.error.message).toMatch(/too small to reach power/);
    const alpha = await analyst.post("/api/power").send({ k: 3, effectF: 0.25, alpha: 5e-324, power: 0.8 });
    expect(alpha.status).toBe(422);
    // The plan's power, computed when the plan is saved, goes through the same mapping.
    const { body } = await analyst
      .post("/api/studies")
      .send({
        title: "Power plan",
        objective: "Test fixture.",
        outcomeName: "Yield",
        outcomeUnit: "g",
        factorName: "Line",
        levels: ["North", "South", "East"],
        controlLevel: null,
        context: "general",
      })
      .expect(201);
    const plan = await analyst
      .put(`/api/studies/${body.study.id}/plan`)
      .send({ power: { effectF: 1e-6, targetPower: 0.8 } });
    expect(plan.status).toBe(422);
    expect(plan.body.error.message).toMatch(/too small to reach power/);
  });

  it("refuses names and units with control characters where a study is saved", async () => {
    const res = await analyst.post("/api/studies").send({
      title: "Bell",
      objective: "Test fixture.",
      outcomeName: "Yield",
      outcomeUnit: "g\u0007",
      factorName: "Line",
      levels: ["North", "So\u0000uth", "East"],
      controlLevel: null,
      context: "general",
    });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toMatch(/control character U\+0007/);
  });

  it("a file name in UTF-8 is kept as written; a 300-character name keeps its extension", async () => {
    const res = await analyst
      .post(`/api/studies/${studyId}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .attach("file", Buffer.from(CSV), "Müller–Ørsted 試験.csv");
    expect(res.status).toBe(201);
    expect(res.body.dataset.fileName).toBe("Müller–Ørsted 試験.csv");
    const long = `${"a".repeat(300)}.csv`;
    const res2 = await analyst
      .post(`/api/studies/${studyId}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .attach("file", Buffer.from(CSV), long);
    expect(res2.status).toBe(201);
    expect(res2.body.dataset.fileName).toMatch(/^a{195}…\.csv$/);
  });
});
