import { randomBytes } from "node:crypto";
import os from "node:os";

/**
 * Names a claimant among the instances sharing the database (mail dispatcher, analysis runner):
 * host, process id and a random part, so two claimants in one process (tests) differ too. At most
 * 98 characters, inside the 100-character `claimed_by` columns.
 */
export function newInstanceId(): string {
  return `${os.hostname().slice(0, 80)}:${process.pid}:${randomBytes(4).toString("hex")}`;
}
