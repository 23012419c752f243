import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { makeTestApp } from "../test-support/test-app.js";

const developers = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../../../DEVELOPERS.md");

describe("DEVELOPERS.md route table", () => {
  it("lists every route the API mounts, and no route it does not", async () => {
    const t = await makeTestApp();
    const doc = fs.readFileSync(developers, "utf8");
    const listed = [...doc.matchAll(/^\| (GET|POST|PUT|PATCH|DELETE) \| `([^`]+)` \|/gm)]
      .map((m) => `${m[1]} ${m[2]}`)
      .sort();
    const mounted = t.routes.map((r) => `${r.method.toUpperCase()} ${r.path}`).sort();
    expect(listed).toEqual(mounted);
    await t.services.stop();
  });
});
