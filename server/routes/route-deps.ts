import type { Logger } from "pino";
import type { AuthLimiters } from "../auth/rate-limits.ts";
import type { Auth } from "../auth/lucia.ts";
import type { Database } from "../db/client.ts";
import type { Env } from "../env.ts";
import type { Mailer } from "../mail/mailer.ts";
import type { PhotoStore } from "../photos/photo-store.ts";

/** What the account routes need, built once in createApp. */
export interface AccountRouteDeps {
  db: Database;
  env: Env;
  logger: Logger;
  auth: Auth;
  mailer: Mailer;
  limiters: AuthLimiters;
  photoStore: PhotoStore;
}
