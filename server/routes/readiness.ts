/**
 * GET /api/ready: whether this server should get traffic, for a load balancer. Unlike
 * /api/health (is the process up), it asks each dependency in turn and answers 503 when one fails
 * or when the server is shutting down, so the balancer drains it before it stops.
 */
import { sql } from "drizzle-orm";
import { Router } from "express";
import type { Logger } from "pino";
import type { Database } from "../db/client.ts";

/** One dependency the server needs to answer requests; `check` throws when it cannot be used. */
export interface ReadinessCheck {
  name: string;
  check: () => Promise<void>;
}

/** A check that hangs counts as failed: the balancer's own probe would time out anyway. */
const CHECK_TIMEOUT_MS = 2_000;

export const databaseReadiness = (db: Database): ReadinessCheck => ({
  name: "database",
  check: async () => {
    await db.execute(sql`select 1`);
  },
});

function withinTimeout(check: () => Promise<void>): Promise<void> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${CHECK_TIMEOUT_MS} ms`)), CHECK_TIMEOUT_MS);
  });
  return Promise.race([check(), timeout]).finally(() => clearTimeout(timer));
}

export function readinessRouter(options: {
  checks: readonly ReadinessCheck[];
  isShuttingDown: () => boolean;
  logger: Logger;
}): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    if (options.isShuttingDown()) {
      res.status(503).json({ ready: false, shuttingDown: true, checks: {} });
      return;
    }
    const outcomes = await Promise.all(
      options.checks.map(async ({ name, check }) => {
        try {
          await withinTimeout(check);
          return [name, "ok"] as const;
        } catch (error) {
          // The reason goes to the log only: an error can name hosts or users, not for the public.
          options.logger.warn({ err: error, check: name }, "readiness check failed");
          return [name, "failed"] as const;
        }
      }),
    );
    const ready = outcomes.every(([, outcome]) => outcome === "ok");
    res.status(ready ? 200 : 503).json({ ready, checks: Object.fromEntries(outcomes) });
  });
  return router;
}
