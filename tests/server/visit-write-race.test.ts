import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { PHOTO_STORES, type TestPhotoStore } from "../setup/photo-stores.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const TRIALS = 6;
const ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number((saturationPressure("R407C", temperatureC, point) - ATMOSPHERE).toFixed(1));

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Issue 13, item 7: an upload racing a sign-off was stored after signedOffAt. The visit's state
 * is now checked under its row lock in the same transaction as every insert, so whatever the
 * timing, nothing lands on a visit after it was signed off; on either photo store, a refused
 * photo's files are removed from it.
 */
describe.each(PHOTO_STORES)("writes racing a sign-off, photos in the $store", ({ store, start }) => {
  let testApp: TestApp;
  let technician: Agent;
  let senior: Agent;
  let rooftopId: string;
  let photo: Buffer;
  let photoStore: TestPhotoStore;

  beforeAll(async () => {
    // Its own photo store, so the file count below is this test's alone.
    photoStore = await start();
    testApp = await createTestApp({ env: photoStore.env });
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    rooftopId = (await technician.get("/api/equipment")).body.equipment.find(
      (unit: { refrigerant: string }) => unit.refrigerant === "R407C",
    ).id;
    // A noisy photo takes sharp long enough to decode that a sign-off can slip in meanwhile.
    photo = await sharp({
      create: {
        width: 1600,
        height: 1200,
        channels: 3,
        background: "#808080",
        noise: { type: "gaussian", mean: 128, sigma: 40 },
      },
    })
      .png()
      .toBuffer();
  });
  afterAll(async () => {
    await testApp?.close();
    await photoStore?.close();
  });

  const newVisit = async () =>
    (await technician.post("/api/visits").send({ equipmentId: rooftopId, reason: "Race trial" })).body.visit
      .id as string;
  const storedFiles = async () => (await photoStore.storedNames()).length;

  it(`never stores a photo after the sign-off (${TRIALS} trials, staggered)`, async () => {
    const outcomes: number[] = [];
    for (let trial = 0; trial < TRIALS; trial++) {
      const visitId = await newVisit();
      const filesBefore = await storedFiles();
      const upload = technician
        .post(`/api/visits/${visitId}/photos`)
        .field("kind", "gauges")
        .attach("photo", photo, "gauges.png")
        .then((response) => response);
      await pause(trial * 15);
      const signOff = await senior.post(`/api/visits/${visitId}/review`).send({ action: "sign-off" });
      const uploaded = await upload;
      expect(signOff.status).toBe(200);
      expect([201, 409]).toContain(uploaded.status);
      outcomes.push(uploaded.status);

      const visit = (await technician.get(`/api/visits/${visitId}`)).body.visit;
      const signedOffAt = Date.parse(visit.signedOffAt);
      for (const stored of visit.photos as { createdAt: string }[])
        expect(Date.parse(stored.createdAt)).toBeLessThanOrEqual(signedOffAt);
      if (uploaded.status === 409) {
        expect(uploaded.body.message).toMatch(/signed off/);
        expect(visit.photos).toHaveLength(0);
        // The files written before the refusal are removed: nothing of the refused photo is kept.
        expect(await storedFiles()).toBe(filesBefore);
      } else {
        expect(visit.photos).toHaveLength(1);
      }
    }
    // The early trials start the sign-off while the photo is still decoding: they must be refused.
    expect(outcomes).toContain(409);
  });

  // Readings never reach the photo store: one run of this, with the default store, is enough.
  it.runIf(store === "local folder")("never stores a reading after the sign-off when many arrive with it", async () => {
    for (let trial = 0; trial < 3; trial++) {
      const visitId = await newVisit();
      const readings = Array.from({ length: 8 }, (_, index) =>
        technician
          .post(`/api/visits/${visitId}/readings`)
          .send({
            circuit: 1,
            suctionPressureKPa: gauge(6, "dew"),
            suctionLineTempC: 12 + index / 10,
            liquidPressureKPa: gauge(42, "bubble"),
            liquidLineTempC: 37,
          })
          .then((response) => response),
      );
      const signOff = senior
        .post(`/api/visits/${visitId}/review`)
        .send({ action: "sign-off" })
        .then((response) => response);
      const [signed, ...answers] = await Promise.all([signOff, ...readings]);
      expect(signed.status).toBe(200);
      const visit = (await technician.get(`/api/visits/${visitId}`)).body.visit;
      const accepted = answers.filter((answer) => answer.status === 201);
      expect(accepted.length + answers.filter((answer) => answer.status === 409).length).toBe(answers.length);
      expect(visit.readings).toHaveLength(accepted.length);
      const signedOffAt = Date.parse(visit.signedOffAt);
      for (const stored of visit.readings as { takenAt: string }[])
        expect(Date.parse(stored.takenAt)).toBeLessThanOrEqual(signedOffAt);
    }
  });
});
