import { existsSync } from "node:fs";
import { constants as zlibConstants } from "node:zlib";
import { fileURLToPath } from "node:url";
import compression from "compression";
import express, { type Express, type RequestHandler } from "express";
import helmet from "helmet";
import { pinoHttp } from "pino-http";
import type { Logger } from "pino";
import { logSerializers } from "./logger.ts";
import { createLucia } from "./auth/lucia.ts";
import { originCheck } from "./auth/origin-check.ts";
import { createAuthLimiters, type AuthLimits } from "./auth/rate-limits.ts";
import { routePermissionGate } from "./auth/route-permissions.ts";
import { loadSession } from "./auth/session.ts";
import type { Database } from "./db/client.ts";
import type { Env } from "./env.ts";
import { apiNotFound, errorHandler } from "./http/error-handler.ts";
import { precompressedAssets } from "./http/precompressed-assets.ts";
import type { Mailer } from "./mail/mailer.ts";
import { photoStoreReadinessCheck, type PhotoStore } from "./photos/photo-store.ts";
import { attemptsRouter } from "./routes/attempts.ts";
import { authRouter } from "./routes/auth.ts";
import { casesRouter } from "./routes/cases.ts";
import { chargeReferencesRouter } from "./routes/charge-references.ts";
import { customersRouter, equipmentRouter, sitesRouter } from "./routes/equipment.ts";
import { photosRouter, visitsRouter } from "./routes/visits.ts";
import { healthRouter } from "./routes/health.ts";
import { databaseReadiness, readinessRouter, type ReadinessCheck } from "./routes/readiness.ts";
import { invitationsRouter } from "./routes/invitations.ts";
import { membersRouter } from "./routes/members.ts";
import { organisationRouter } from "./routes/organisation.ts";
import { outboxRouter } from "./routes/outbox.ts";
import { profileRouter } from "./routes/profile.ts";
import { proceduresRouter } from "./routes/procedures.ts";
import {
  cylindersRouter,
  equipmentRefrigerantRouter,
  registerRouter,
  visitRefrigerantRouter,
} from "./routes/register.ts";

export interface AppDeps {
  db: Database;
  env: Env;
  logger: Logger;
  /** Outgoing mail (server/mail/mailer.ts); the caller starts it and closes it. */
  mailer: Mailer;
  /** Where photos are kept (server/photos/create-photo-store.ts); the caller opens it and closes it. */
  photoStore: PhotoStore;
  /** Tighter or looser sign-in and reset throttles (tests); defaults in server/auth/rate-limits.ts. */
  authLimits?: Partial<AuthLimits>;
  /** Serves the client: Vite's dev middleware, or nothing (the built files are served from dist/). */
  clientMiddleware?: RequestHandler;
  /**
   * Keep validated sessions a minute in memory (server/auth/session-cache.ts): on by default, for
   * the one process on PGlite; off when several app servers share a PostgreSQL.
   */
  cacheSessions?: boolean;
  /** What GET /api/ready asks before saying yes; the database by default. */
  readinessChecks?: readonly ReadinessCheck[];
  /** True once the server is stopping: GET /api/ready answers 503 so a load balancer drains it. */
  isShuttingDown?: () => boolean;
}

const distFolder = fileURLToPath(new URL("../dist", import.meta.url));

/** JSON bodies stay small: readings and forms are a few kB; uploads go through multer. */
const JSON_BODY_LIMIT = "200kb";

/**
 * The API's answers are compressed on every request, so a busy server pays the default level's
 * CPU on each: gzip level 4 and brotli quality 3 take 30–50 % less for 3 % more bytes (a saved
 * reading's 11 kB answer: gzip 120–160 µs and 3,005 B instead of 240–270 µs and 2,930 B; brotli
 * 170 µs and 3,034 B instead of 210 µs and 2,932 B). The built client keeps the defaults: it is
 * downloaded once and cached, so there its bytes count more than the CPU.
 */
const compressApi = compression({ level: 4, brotli: { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 3 } } });
const compressClient = compression();

/** Builds the Express app; never listens, so tests can drive it in-process. */
export function createApp(deps: AppDeps): Express {
  const { env, logger } = deps;
  const app = express();
  app.disable("x-powered-by"); // no need to advertise the framework
  // Rate limits see the client's address behind the proxies named in TRUST_PROXY, and only those.
  app.set("trust proxy", env.TRUST_PROXY);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Photos are shown from blob: URLs before upload; fonts are bundled, never from a CDN.
          "img-src": ["'self'", "data:", "blob:"],
          // Only an https install may ask browsers to upgrade: on a plain-http LAN host (a tablet
          // on the workshop network) the upgraded requests would have nowhere to go.
          "upgrade-insecure-requests":
            env.NODE_ENV === "production" && new URL(env.APP_URL).protocol === "https:" ? [] : null,
          // Vite's dev server injects an inline React Refresh preamble and talks over a
          // websocket; the production build has neither, so only development relaxes these.
          ...(deps.clientMiddleware
            ? { "script-src": ["'self'", "'unsafe-inline'"], "connect-src": ["'self'", "ws:"] }
            : {}),
        },
      },
    }),
  );
  // Readings and tables compress well on slow mobile links.
  app.use((req, res, next) => (req.path.startsWith("/api/") ? compressApi : compressClient)(req, res, next));
  app.use(
    pinoHttp({
      logger,
      // Cookies and tokens never reach the log: see server/logger.ts.
      serializers: logSerializers,
      // Quiet logs: health probes and static assets are noise.
      autoLogging: {
        ignore: (req) => req.url === "/api/health" || req.url === "/api/ready" || !req.url?.startsWith("/api"),
      },
      customLogLevel: (_req, res, error) =>
        error || res.statusCode >= 500 ? "error" : res.statusCode >= 400 ? "warn" : "info",
    }),
  );
  app.use("/api", express.json({ limit: JSON_BODY_LIMIT }));

  const auth = createLucia(deps.db, env);
  const accountDeps = { ...deps, auth, limiters: createAuthLimiters(deps.db, deps.authLimits) };

  const api = express.Router();
  api.use(originCheck(env.APP_URL)); // refuse state-changing requests from other sites (CSRF)
  api.use(loadSession(auth, { cacheSessions: deps.cacheSessions ?? true })); // res.locals.auth for signed-in users; see server/auth/session.ts
  api.use(routePermissionGate()); // who may call which route: the one table in server/auth/route-permissions.ts
  api.use("/health", healthRouter(deps.db));
  api.use(
    "/ready",
    readinessRouter({
      checks: deps.readinessChecks ?? [databaseReadiness(deps.db), photoStoreReadinessCheck(deps.photoStore)],
      isShuttingDown: deps.isShuttingDown ?? (() => false),
      logger,
    }),
  );
  api.use("/auth", authRouter(accountDeps));
  api.use("/members", membersRouter(accountDeps));
  api.use("/invitations", invitationsRouter(accountDeps));
  api.use("/profile", profileRouter(accountDeps));
  api.use("/outbox", outboxRouter(accountDeps));
  api.use("/organisation", organisationRouter(deps));
  api.use("/customers", customersRouter(deps));
  api.use("/sites", sitesRouter(deps));
  api.use("/equipment", equipmentRouter(deps));
  // One mount for a visit's routes: its readings, entries and review (server/routes/visits.ts),
  // its procedure records (procedures.ts) and its refrigerant (register.ts).
  api.use("/visits", visitsRouter(accountDeps), proceduresRouter(deps), visitRefrigerantRouter(deps));
  api.use("/photos", photosRouter(deps));
  // The refrigerant register (server/routes/register.ts): its equipment route sits beside the unit's.
  api.use("/equipment", equipmentRefrigerantRouter(deps));
  // Each circuit's charge reference point (server/routes/charge-references.ts) sits beside the unit.
  api.use("/equipment", chargeReferencesRouter(deps));
  api.use("/cylinders", cylindersRouter(deps));
  api.use("/register", registerRouter(deps));
  api.use("/cases", casesRouter(deps));
  api.use("/attempts", attemptsRouter(deps));
  api.use(apiNotFound);
  app.use("/api", api);

  if (deps.clientMiddleware) {
    app.use(deps.clientMiddleware);
  } else if (existsSync(distFolder)) {
    // Hashed asset names change with content, so they can be cached for a year.
    app.use("/assets", precompressedAssets(`${distFolder}/assets`, "public, max-age=31536000, immutable"));
    app.use("/assets", express.static(`${distFolder}/assets`, { immutable: true, maxAge: "1y", index: false }));
    app.use(
      express.static(distFolder, {
        index: false,
        maxAge: "1h",
        // The service worker and the manifest keep their names from one version to the next: the
        // browser must ask each time, or a deployed fix would wait an hour to reach the devices.
        setHeaders: (res, file) => {
          if (/[\\/](sw\.js|manifest\.webmanifest)$/.test(file)) res.setHeader("Cache-Control", "no-cache");
        },
      }),
    );
    app.get("/{*splat}", (_req, res) => {
      res.setHeader("Cache-Control", "no-cache");
      res.sendFile(`${distFolder}/index.html`);
    });
  }

  app.use(errorHandler);
  return app;
}
