/**
 * The company's limits are one object (README decision 038): what an owner sets through the
 * Company limits API is stored in settings.procedureLimits, the same object the procedure routes
 * judge by, and migration 0021 moved the figures kept under keys of their own into it.
 */
import { readFileSync } from "node:fs";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrationsFolder } from "@server/db/client.ts";
import { organisations } from "@server/db/schema.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";

const MIGRATION = readFileSync(`${migrationsFolder}/0021_company_limits_in_one_object.sql`, "utf8");

describe("the company's limits, one object", () => {
  let testApp: TestApp;
  let organisationId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    const [row] = await testApp.database.db.select({ id: organisations.id }).from(organisations).limit(1);
    organisationId = row!.id;
  });
  afterAll(() => testApp.close());

  const storedSettings = async () =>
    (
      await testApp.database.db
        .select({ settings: organisations.settings })
        .from(organisations)
        .where(eq(organisations.id, organisationId))
    )[0]!.settings;

  it("stores what the owner sets in the limits object the procedures read, and clears it back to the default", async () => {
    const owner = await signedIn(testApp.app, BELLBIRD.owner);
    const version = (await owner.get("/api/organisation/settings")).body.version as number;
    const saved = await owner
      .patch("/api/organisation/settings")
      .set("If-Match", `"${version}"`)
      .send({ evacuationTargetMicrons: 250, pressureTestAllowedDropKPa: 7 });
    expect(saved.status).toBe(200);
    expect(await storedSettings()).toEqual({
      procedureLimits: { evacuation: { targetMicrons: 250 }, pressureHold: { allowedDropKPa: 7 } },
    });

    const cleared = await owner
      .patch("/api/organisation/settings")
      .set("If-Match", `"${saved.body.version}"`)
      .send({ evacuationTargetMicrons: null });
    expect(cleared.body.settings).toEqual({ evacuationTargetMicrons: null, pressureTestAllowedDropKPa: 7 });
    expect(await storedSettings()).toEqual({ procedureLimits: { pressureHold: { allowedDropKPa: 7 } } });
  });

  it("keeps the limits an organisation set in the engine's groups when the owner changes a figure", async () => {
    await testApp.database.db
      .update(organisations)
      .set({ settings: { procedureLimits: { evacuation: { leakRiseMicrons: 4000 } }, theme: "kept" } })
      .where(eq(organisations.id, organisationId));
    const owner = await signedIn(testApp.app, BELLBIRD.owner);
    const version = (await owner.get("/api/organisation/settings")).body.version as number;
    await owner
      .patch("/api/organisation/settings")
      .set("If-Match", `"${version}"`)
      .send({ evacuationTargetMicrons: 300 });
    expect(await storedSettings()).toEqual({
      procedureLimits: { evacuation: { leakRiseMicrons: 4000, targetMicrons: 300 } },
      theme: "kept",
    });
  });

  it("migration 0021 moves the figures kept under keys of their own into the limits object", async () => {
    await testApp.database.db
      .update(organisations)
      .set({
        settings: {
          evacuationTargetMicrons: 300,
          pressureTestAllowedDropKPa: 5,
          procedureLimits: { evacuation: { targetMicrons: 700, leakRiseMicrons: 4000 } },
          theme: "kept",
        },
      })
      .where(eq(organisations.id, organisationId));
    await testApp.database.db.execute(sql.raw(MIGRATION));
    expect(await storedSettings()).toEqual({
      // The figure the owner set through the API wins over one under procedureLimits.
      procedureLimits: {
        evacuation: { targetMicrons: 300, leakRiseMicrons: 4000 },
        pressureHold: { allowedDropKPa: 5 },
      },
      theme: "kept",
    });
    const owner = await signedIn(testApp.app, BELLBIRD.owner);
    expect((await owner.get("/api/organisation/settings")).body.settings).toEqual({
      evacuationTargetMicrons: 300,
      pressureTestAllowedDropKPa: 5,
    });

    // Settings with neither key are left as they are.
    await testApp.database.db
      .update(organisations)
      .set({ settings: { theme: "kept" } })
      .where(eq(organisations.id, organisationId));
    await testApp.database.db.execute(sql.raw(MIGRATION));
    expect(await storedSettings()).toEqual({ theme: "kept" });
  });
});
