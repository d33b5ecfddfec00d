import type { Express } from "express";
import sharp from "sharp";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "@server/app.ts";
import { readEnv } from "@server/env.ts";
import { createLogger } from "@server/logger.ts";
import { createPhotoStore } from "@server/photos/create-photo-store.ts";
import type { PhotoStore } from "@server/photos/photo-store.ts";
import { DEMO_PASSWORD } from "@server/db/seed/demo-scenario.ts";
import { BELLBIRD, seedBellbird } from "../../setup/demo-accounts.ts";
import { startS3TestStore, type TestPhotoStore } from "../../setup/photo-stores.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";

/**
 * Issue 20: app servers behind a load balancer share one database and one bucket, so a photo
 * uploaded through one is served by any other. Two apps over one database, each with its own
 * S3 client, stand in for two servers.
 */
describe("photos shared by two app servers through one bucket", () => {
  let bucket: TestPhotoStore;
  let first: TestApp;
  let secondStore: PhotoStore;
  let second: Express;
  let cookie: string;

  beforeAll(async () => {
    bucket = await startS3TestStore();
    first = await createTestApp({ env: bucket.env });
    await seedBellbird(first);
    const env = readEnv({ NODE_ENV: "test", DATA_DIR: "memory://", APP_URL: "http://satura.test", ...bucket.env });
    secondStore = await createPhotoStore(env.photoStore);
    second = createApp({
      db: first.database.db,
      env,
      logger: createLogger(env),
      mailer: first.mailer,
      photoStore: secondStore,
    });
    const signIn = await request(first.app)
      .post("/api/auth/sign-in")
      .send({ email: BELLBIRD.technician, password: DEMO_PASSWORD });
    cookie = (signIn.headers["set-cookie"] as unknown as string[]).map((line) => line.split(";")[0]).join("; ");
  });
  afterAll(async () => {
    secondStore?.close();
    await first?.close();
    await bucket?.close();
  });

  it("serves through one server the photo uploaded through the other, with the same bytes", async () => {
    const unit = (await request(first.app).get("/api/equipment").set("Cookie", cookie)).body.equipment[0];
    const visit = await request(first.app)
      .post("/api/visits")
      .set("Cookie", cookie)
      .send({ equipmentId: unit.id, reason: "Two servers" });
    const picture = await sharp({ create: { width: 60, height: 40, channels: 3, background: "#446688" } })
      .png()
      .toBuffer();
    const uploaded = await request(first.app)
      .post(`/api/visits/${visit.body.visit.id}/photos`)
      .set("Cookie", cookie)
      .field("kind", "nameplate")
      .attach("photo", picture, "plate.png");
    expect(uploaded.status).toBe(201);

    const fromFirst = await request(first.app).get(uploaded.body.photo.url).set("Cookie", cookie).buffer(true);
    const fromSecond = await request(second).get(uploaded.body.photo.url).set("Cookie", cookie).buffer(true);
    expect(fromSecond.status).toBe(200);
    expect(fromSecond.headers["content-type"]).toBe("image/png");
    expect(Buffer.compare(fromSecond.body, fromFirst.body)).toBe(0);
    expect((await request(second).get(uploaded.body.photo.thumbnailUrl).set("Cookie", cookie)).status).toBe(200);
    // Without a session the other server refuses it as well: the bucket is never reached from outside.
    expect((await request(second).get(uploaded.body.photo.url)).status).toBe(401);
  });
});
