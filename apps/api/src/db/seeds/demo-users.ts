import type { DataSource } from "typeorm";
import { hashPassword } from "../../auth/password.js";
import type { Role } from "../../auth/roles.js";
import { User } from "../../modules/users/user.entity.js";

/** One demo account per role; all share the demo password shown in demo mode only. */
export const DEMO_USERS: { email: string; displayName: string; role: Role }[] = [
  { email: "analyst@waymark.test", displayName: "Ada Okafor", role: "analyst" },
  { email: "reviewer@waymark.test", displayName: "Rui Takahashi", role: "reviewer" },
  { email: "writer@waymark.test", displayName: "Wen Lindqvist", role: "writer" },
  { email: "admin@waymark.test", displayName: "Amal Reyes", role: "admin" },
];

/** Inserts the demo accounts that are missing; existing accounts are left as they are. */
export async function seedDemoUsers(ds: DataSource, password: string, cost: number): Promise<void> {
  const repo = ds.getRepository(User);
  const hash = await hashPassword(password, cost);
  for (const u of DEMO_USERS) {
    if (await repo.existsBy({ email: u.email })) continue;
    await repo.insert({ ...u, passwordHash: hash, active: true });
  }
}
