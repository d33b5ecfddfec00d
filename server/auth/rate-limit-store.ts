import { createHash } from "node:crypto";
import type { ClientRateLimitInfo, Options, Store } from "express-rate-limit";
import type { Database } from "../db/client.ts";
import { countHit, deleteCounter, readCounter, uncountHit } from "../db/rate-limit-counters.ts";

/**
 * An express-rate-limit store over the database (server/db/rate-limit-counters.ts), so every
 * app server sharing the database shares the counts (express-rate-limit's own MemoryStore
 * counts per process). Keys are stored as SHA-256 digests of the throttle's name and the key,
 * so the table holds no e-mail address or IP address.
 */
export class DatabaseRateLimitStore implements Store {
  /** Counts live in the database: a hit in one process counts in all (express-rate-limit's double-count check). */
  readonly localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly db: Database,
    /** The throttle's name, e.g. "sign-in:account"; also express-rate-limit's prefix. */
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private digest(key: string): string {
    return createHash("sha256").update(`${this.prefix}\n${key}`).digest("hex");
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const counter = await countHit(this.db, this.digest(key), this.windowMs);
    return { totalHits: counter.hits, resetTime: counter.resetAt };
  }

  async decrement(key: string): Promise<void> {
    await uncountHit(this.db, this.digest(key));
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const counter = await readCounter(this.db, this.digest(key));
    return counter ? { totalHits: counter.hits, resetTime: counter.resetAt } : undefined;
  }

  async resetKey(key: string): Promise<void> {
    await deleteCounter(this.db, this.digest(key));
  }
}
