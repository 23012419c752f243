import request from "supertest";
import type { Express } from "express";

/**
 * A supertest agent that carries its session's CSRF token on every request, as the web app's
 * API client does. Signed out until it signs in.
 */
export async function anon(app: Express) {
  const agent = request.agent(app);
  const { body } = await agent.get("/api/auth/csrf").expect(200);
  agent.set("x-csrf-token", body.token as string);
  return agent;
}

/** A supertest agent signed in as one of the demo accounts. */
export async function signedIn(
  app: Express,
  role: "analyst" | "reviewer" | "writer" | "admin",
  password: string,
) {
  const agent = await anon(app);
  const res = await agent
    .post("/api/auth/login")
    .send({ email: `${role}@waymark.test`, password })
    .expect(200);
  // Sign-in replaces the CSRF token; carry the new one, as the web app's API client does.
  agent.set("x-csrf-token", res.headers["x-csrf-token"] as string);
  return agent;
}
