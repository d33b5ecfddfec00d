import { z } from "zod";

/** GET /api/health: the server is up and its database answers. */
export const HealthSchema = z.object({
  status: z.enum(["ok", "degraded"]),
  db: z.enum(["ok", "error"]),
  version: z.string(),
});
export type Health = z.infer<typeof HealthSchema>;
