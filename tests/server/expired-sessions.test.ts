import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { deleteExpiredSessions } from "@server/db/expired-sessions.ts";
import { sessions } from "@server/db/schema.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";

describe("expired session purge", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("deletes only sessions past their expiry", async () => {
    await signedIn(testApp.app, BELLBIRD.technician);
    await signedIn(testApp.app, BELLBIRD.senior);
    const { db } = testApp.database;
    const [first] = await db.select().from(sessions).limit(1);
    await db
      .update(sessions)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(sessions.id, first!.id));
    expect(await deleteExpiredSessions(db)).toBe(1);
    expect(await db.select().from(sessions)).toHaveLength(1);
    expect(await deleteExpiredSessions(db)).toBe(0);
  });
});
