import "reflect-metadata";
import fs from "node:fs";
import path from "node:path";
import compression from "compression";
import express, { Router, type RequestParamHandler } from "express";
import session from "express-session";
import helmet from "helmet";
import type { DataSource } from "typeorm";
import { createPassport } from "./auth/passport.js";
import { csrfSynchronisedProtection } from "./auth/csrf.js";
import { absoluteSessionLimit } from "./auth/session-limit.js";
import type { Env } from "./config/env.js";
import { errorHandler, notFoundHandler } from "./http/error-handler.js";
import { HttpError } from "./http/errors.js";
import { mountRoutes, type MountedRoute } from "./http/route-table.js";
import { analysisRoutes } from "./modules/analyses/analysis.routes.js";
import { AnalysisRunner, runSettingsFrom } from "./modules/analyses/runs/analysis-runner.js";
import { auditRoutes } from "./modules/audit/audit.routes.js";
import { authRoutes } from "./modules/auth/auth.routes.js";
import { configRoutes } from "./modules/config/config.routes.js";
import { datasetRoutes } from "./modules/datasets/dataset.routes.js";
import { healthRoutes } from "./modules/health/health.routes.js";
import { readinessRoutes } from "./modules/health/readiness.routes.js";
import { invitationRoutes } from "./modules/invitations/invitation.routes.js";
import { devMailRoutes } from "./modules/mail/dev-mail.routes.js";
import type { MailDispatcher } from "./modules/mail/mail-dispatcher.js";
import { organizationRoutes } from "./modules/organization/organization.routes.js";
import { powerRoutes } from "./modules/power/power.routes.js";
import { reportRoutes } from "./modules/reports/report.routes.js";
import { reviewQueueRoutes, studyReviewRoutes } from "./modules/reviews/review.routes.js";
import { TypeormSessionStore } from "./modules/sessions/typeorm-session-store.js";
import { studyRoutes } from "./modules/studies/study.routes.js";
import { userRoutes } from "./modules/users/user.routes.js";
import { configureTaskPool } from "./workers/task-pool.js";

export const SESSION_COOKIE = "waymark.sid";

export interface AppServices {
  mail: MailDispatcher;
}

export interface BuiltApp {
  app: express.Express;
  routes: MountedRoute[];
  sessionStore: TypeormSessionStore;
  /** Analysis runs: started here; on shutdown call `stopSweeping()`, then `releaseClaims()` once requests end. */
  analysisRuns: AnalysisRunner;
}

/** Builds the Express app around an open data source; server.ts listens, tests use supertest. */
export function createApp(ds: DataSource, env: Env, services: AppServices): BuiltApp {
  configureTaskPool({
    timeoutMs: env.TASK_TIMEOUT_SECONDS * 1000,
    memoryMb: env.WORKER_MEMORY_MB,
    threads: env.TASK_WORKER_THREADS,
  });
  const analysisRuns = new AnalysisRunner(ds, runSettingsFrom(env));
  analysisRuns.start();
  const app = express();
  app.disable("x-powered-by");
  if (env.TRUST_PROXY) app.set("trust proxy", 1);

  app.use(
    helmet({
      contentSecurityPolicy: {
        // Only our own origin: fonts and scripts are self-hosted; inline styles are what the chart
        // library sets. Upgrading requests to https makes sense only when served over https.
        directives: {
          defaultSrc: ["'self'"],
          fontSrc: ["'self'"],
          imgSrc: ["'self'", "data:", "blob:"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          upgradeInsecureRequests: env.TRUST_PROXY ? [] : null,
        },
      },
    }),
  );
  app.use(compression({ threshold: 8 * 1024 })); // below 8 KiB, gzip costs more time than it saves
  app.use(express.json({ limit: "1mb" }));

  // Health and readiness answer before any session work: no cookie parsing, no store read, no write.
  const early = Router();
  const healthMounted = [
    ...mountRoutes(early, "/health", healthRoutes()),
    ...mountRoutes(early, "/ready", readinessRoutes(ds)),
  ];
  app.use("/api", early);

  const sessionStore = new TypeormSessionStore(ds);
  const sessions = session({
    name: SESSION_COOKIE,
    secret: env.sessionSecret,
    store: sessionStore,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    // Idle timeout: the cookie and the stored session expire after SESSION_IDLE_MINUTES without a request.
    cookie: { httpOnly: true, sameSite: "lax", secure: "auto", maxAge: env.SESSION_IDLE_MINUTES * 60_000 },
  });
  // A read without a session cookie has no session to load and makes none: only /api/auth, where
  // a CSRF token is asked for, and changes (refused without a token) need one.
  app.use((req, res, next) => {
    const safe = req.method === "GET" || req.method === "HEAD";
    const hasCookie = req.headers.cookie?.includes(`${SESSION_COOKIE}=`) ?? false;
    if (safe && !hasCookie && !req.path.startsWith("/api/auth/")) return next();
    sessions(req, res, next);
  });
  const pp = createPassport(ds, env.BCRYPT_COST);
  app.use(pp.initialize());
  const sessionLimit = absoluteSessionLimit(env.SESSION_MAX_HOURS);
  const restoreUser = pp.session();
  app.use((req, res, next) => {
    if (!req.session) return next(); // a cookie-less read: nobody is signed in
    sessionLimit(req, res, (err?: unknown) => (err ? next(err) : restoreUser(req, res, next)));
  });
  // Mail queued by a request goes out right after it, without the request waiting for it.
  app.use((req, res, next) => {
    if (req.method !== "GET") res.on("finish", () => void services.mail.kick());
    next();
  });

  const api = Router();
  api.use(csrfSynchronisedProtection);
  // Ids in the address are checked before any handler, so no "NaN" or "1e3" reaches SQL.
  for (const name of ["id", "datasetId", "analysisId"]) api.param(name, checkId);
  const routes = [
    ...healthMounted,
    ...mountRoutes(api, "/config", configRoutes(env)),
    ...mountRoutes(api, "/auth", authRoutes(pp, ds, env, sessionStore)),
    ...mountRoutes(api, "/studies", studyRoutes(ds)),
    ...mountRoutes(api, "/studies", datasetRoutes(ds, env)),
    ...mountRoutes(api, "/studies", analysisRoutes(ds, analysisRuns)),
    ...mountRoutes(api, "/studies", studyReviewRoutes(ds, env)),
    ...mountRoutes(api, "/studies", reportRoutes(ds)),
    ...mountRoutes(api, "/reviews", reviewQueueRoutes(ds)),
    ...mountRoutes(api, "/power", powerRoutes()),
    ...mountRoutes(api, "/audit", auditRoutes(ds)),
    ...mountRoutes(api, "/invitations", invitationRoutes(ds, env)),
    ...mountRoutes(api, "/users", userRoutes(ds, sessionStore)),
    ...mountRoutes(api, "/organization", organizationRoutes(ds)),
    ...(env.fakeMail ? mountRoutes(api, "/dev", devMailRoutes(ds)) : []),
  ];
  app.use("/api", api);
  app.use("/api", notFoundHandler);

  serveWebApp(app, env.WEB_DIST);
  app.use(errorHandler);
  // The table records full paths, as a client sees them.
  return { app, routes: routes.map((r) => ({ ...r, path: `/api${r.path}` })), sessionStore, analysisRuns };
}

/** A row id in the address: a whole number from 1 to 2^31 − 1, written plainly. */
const checkId: RequestParamHandler = (_req, _res, next, value: string, name: string) => {
  if (/^[1-9][0-9]{0,9}$/.test(value) && Number(value) <= 2 ** 31 - 1) return next();
  next(
    new HttpError(
      400,
      "invalid_id",
      `"${value.slice(0, 40)}" is not a valid ${name === "id" ? "id" : name} in the address; ids are whole numbers.`,
    ),
  );
};

/** Serves the built web app (one port for both) with the SPA fallback, when a build exists. */
function serveWebApp(app: express.Express, dist: string): void {
  const index = path.join(dist, "index.html");
  if (!fs.existsSync(index)) return;
  app.use(express.static(dist, { index: false, maxAge: "1h" }));
  app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(index));
}
