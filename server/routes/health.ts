import { sql } from "drizzle-orm";
import { Router } from "express";
import type { Database } from "../db/client.ts";
import { appVersion } from "../version.ts";

export function healthRouter(db: Database): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    let dbStatus: "ok" | "error" = "ok";
    try {
      await db.execute(sql`select 1`);
    } catch {
      dbStatus = "error";
    }
    res
      .status(dbStatus === "ok" ? 200 : 503)
      .json({ status: dbStatus === "ok" ? "ok" : "degraded", db: dbStatus, version: appVersion });
  });
  return router;
}
