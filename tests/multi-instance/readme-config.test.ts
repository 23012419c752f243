import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

describe("the README shows the proxy configuration the two-instance test runs", () => {
  it("has the same text in its haproxy block as deploy/haproxy.cfg", () => {
    const readme = fs.readFileSync(path.join(root, "README.md"), "utf8");
    const block = /```haproxy\n([\s\S]*?)```/.exec(readme);
    expect(block, "README.md has a ```haproxy block").not.toBeNull();
    expect(block![1]).toBe(fs.readFileSync(path.join(root, "deploy/haproxy.cfg"), "utf8"));
  });
});
