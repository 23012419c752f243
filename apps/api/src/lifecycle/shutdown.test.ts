import { afterEach, describe, expect, it } from "vitest";
import {
  isDraining,
  onShutdown,
  resetShutdownForTests,
  runShutdownHooks,
  startDraining,
} from "./shutdown.js";

afterEach(() => resetShutdownForTests());

describe("shutdown hooks", () => {
  it("runs hooks newest first, and a failing or hanging hook does not stop the others", async () => {
    const ran: string[] = [];
    const logged: string[] = [];
    onShutdown("first", () => void ran.push("first"));
    onShutdown("fails", () => {
      throw new Error("boom");
    });
    onShutdown("hangs", () => new Promise<void>(() => undefined));
    onShutdown("last", async () => void ran.push("last"));
    await runShutdownHooks({ timeoutMs: 50, log: (m) => logged.push(m) });
    expect(ran).toEqual(["last", "first"]);
    expect(logged).toEqual([
      'shutdown step "hangs" failed: did not finish within 50 ms',
      'shutdown step "fails" failed: boom',
    ]);
  });

  it("a removed hook does not run; draining is off until started", async () => {
    const ran: string[] = [];
    const remove = onShutdown("gone", () => void ran.push("gone"));
    remove();
    await runShutdownHooks();
    expect(ran).toEqual([]);
    expect(isDraining()).toBe(false);
    startDraining();
    expect(isDraining()).toBe(true);
  });
});
