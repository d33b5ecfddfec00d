/**
 * Periodic work runs once per interval across app servers (docs/deploy.md, "Background jobs"):
 * two servers are two callers on one database here; on PostgreSQL (npm run test:server:pg) the
 * count and the lock are the shared ones every server sees.
 */
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { LOCK_KEYS } from "@server/db/advisory-locks.ts";
import type { DatabaseHandle } from "@server/db/client.ts";
import { oncePerInterval } from "@server/db/periodic-jobs.ts";
import { createTestDatabase } from "../setup/test-database.ts";

const HOUR_MS = 60 * 60 * 1000;

describe("oncePerInterval", () => {
  let database: DatabaseHandle;
  beforeEach(async () => {
    database = await createTestDatabase();
  });
  afterEach(() => database.close());

  it("runs a job once in its interval, whichever server's timer fires next", async () => {
    let runs = 0;
    const job = async () => ++runs;
    expect(await oncePerInterval(database.db, LOCK_KEYS.purge, HOUR_MS, job)).toBe(1);
    expect(await oncePerInterval(database.db, LOCK_KEYS.purge, HOUR_MS, job)).toBeUndefined();
    expect(runs).toBe(1);
  });

  it("runs it again once the interval has ended", async () => {
    let runs = 0;
    const job = async () => ++runs;
    await oncePerInterval(database.db, LOCK_KEYS.purge, 50, job);
    await new Promise((resolve) => setTimeout(resolve, 120));
    await oncePerInterval(database.db, LOCK_KEYS.purge, 50, job);
    expect(runs).toBe(2);
  });

  it("does not count a run that failed: the next timer tries again", async () => {
    await expect(
      oncePerInterval(database.db, LOCK_KEYS.purge, HOUR_MS, async () => {
        throw new Error("the database went away mid-purge");
      }),
    ).rejects.toThrow(/went away/);
    expect(await oncePerInterval(database.db, LOCK_KEYS.purge, HOUR_MS, async () => "ran")).toBe("ran");
  });
});
