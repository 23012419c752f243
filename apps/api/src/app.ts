import "reflect-metadata";
import fs from "node:fs";
import path from "node:path";
import express, { Router } from "express";
import session from "express-session";
import helmet from "helmet";
import type { DataSource } from "typeorm";
import { createPassport } from "./auth/passport.js";
import type { Env } from "./config/env.js";
import { errorHandler, notFoundHandler } from "./http/error-handler.js";
import { mountRoutes, type MountedRoute } from "./http/route-table.js";
import { authRoutes } from "./modules/auth/auth.routes.js";
import { configRoutes } from "./modules/config/config.routes.js";
import { healthRoutes } from "./modules/health/health.routes.js";
import { TypeormSessionStore } from "./modules/sessions/typeorm-session-store.js";

export const SESSION_COOKIE = "waymark.sid";
const SESSION_MAX_AGE_MS = 8 * 60 * 60 * 1000;

export interface BuiltApp {
  app: express.Express;
  routes: MountedRoute[];
  sessionStore: TypeormSessionStore;
}

/** Builds the Express app around an open data source; server.ts listens, tests use supertest. */
export function createApp(ds: DataSource, env: Env): BuiltApp {
  const app = express();
  app.disable("x-powered-by");
  if (env.TRUST_PROXY) app.set("trust proxy", 1);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: { defaultSrc: ["'self'"], imgSrc: ["'self'", "data:", "blob:"], styleSrc: ["'self'", "'unsafe-inline'"] },
      },
    }),
  );
  app.use(express.json({ limit: "1mb" }));

  const sessionStore = new TypeormSessionStore(ds);
  app.use(
    session({
      name: SESSION_COOKIE,
      secret: env.sessionSecret,
      store: sessionStore,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: "lax", secure: "auto", maxAge: SESSION_MAX_AGE_MS },
    }),
  );
  const pp = createPassport(ds, env.BCRYPT_COST);
  app.use(pp.initialize());
  app.use(pp.session());

  const api = Router();
  const routes = [
    ...mountRoutes(api, "/health", healthRoutes()),
    ...mountRoutes(api, "/config", configRoutes(env)),
    ...mountRoutes(api, "/auth", authRoutes(pp, ds)),
  ];
  app.use("/api", api);
  app.use("/api", notFoundHandler);

  serveWebApp(app, env.WEB_DIST);
  app.use(errorHandler);
  return { app, routes, sessionStore };
}

/** Serves the built web app (one port for both) with the SPA fallback, when a build exists. */
function serveWebApp(app: express.Express, dist: string): void {
  const index = path.join(dist, "index.html");
  if (!fs.existsSync(index)) return;
  app.use(express.static(dist, { index: false, maxAge: "1h" }));
  app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(index));
}
