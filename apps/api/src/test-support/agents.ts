import request from "supertest";
import type { Express } from "express";

/** A supertest agent signed in as one of the demo accounts. */
export async function signedIn(
  app: Express,
  role: "analyst" | "reviewer" | "writer" | "admin",
  password: string,
) {
  const agent = request.agent(app);
  await agent
    .post("/api/auth/login")
    .send({ email: `${role}@waymark.test`, password })
    .expect(200);
  return agent;
}
