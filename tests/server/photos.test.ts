import { randomUUID } from "node:crypto";
import { crc32 } from "node:zlib";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { photos } from "@server/db/schema.ts";
import { MAX_PHOTO_PIXELS } from "@server/photos/prepare-photo.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { PHOTO_STORES, type TestPhotoStore } from "../setup/photo-stores.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** EXIF tag 0x8825 points at the GPS IFD (EXIF 2.32 §4.6.3); it is written in the file's byte order. */
const hasGpsPointer = (exif: Buffer | undefined) =>
  Boolean(exif && (exif.includes(Buffer.from([0x88, 0x25])) || exif.includes(Buffer.from([0x25, 0x88]))));

/**
 * A PNG whose header claims width × height, with one tiny row of data: what a decompression
 * bomb looks like to a server that trusts the header (PNG spec §11.2.2, IHDR; CRC per §5.5).
 */
async function pngClaiming(width: number, height: number): Promise<Buffer> {
  const png = Buffer.from(
    await sharp({ create: { width: 1, height: 1, channels: 3, background: "#000" } })
      .png()
      .toBuffer(),
  );
  // Signature (8 bytes), then IHDR: length (4), type (4), width (4), height (4), … , CRC (4).
  png.writeUInt32BE(width, 16);
  png.writeUInt32BE(height, 20);
  png.writeUInt32BE(crc32(png.subarray(12, 29)), 29);
  return png;
}

// Issue 13, item 8 (and the cut-off PNG of item 5); issue 20: the same on each photo store.
describe.each(PHOTO_STORES)("photo uploads, kept in the $store", ({ start }) => {
  let photoStore: TestPhotoStore;
  let testApp: TestApp;
  let technician: Agent;
  let visitId: string;

  beforeAll(async () => {
    photoStore = await start();
    testApp = await createTestApp({ env: photoStore.env });
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    const unit = (await technician.get("/api/equipment")).body.equipment[0];
    visitId = (await technician.post("/api/visits").send({ equipmentId: unit.id, reason: "Photo checks" })).body.visit
      .id;
  });
  afterAll(async () => {
    await testApp?.close();
    await photoStore?.close();
  });

  const upload = (photo: Buffer, name: string) =>
    technician.post(`/api/visits/${visitId}/photos`).field("kind", "gauges").attach("photo", photo, name);
  const smallJpeg = () =>
    sharp({ create: { width: 40, height: 30, channels: 3, background: "#336699" } })
      .jpeg()
      .toBuffer();
  const photoRow = async (photoId: string) => {
    const [row] = await testApp.database.db.select().from(photos).where(eq(photos.id, photoId));
    return row!;
  };

  it("stores the original without its EXIF (GPS position, phone), turned upright", async () => {
    const original = await sharp({ create: { width: 400, height: 200, channels: 3, background: "#336699" } })
      .jpeg()
      .withExif({
        IFD0: { Make: "Phonemaker", Model: "Gauge-Cam 9" },
        IFD3: {
          GPSLatitudeRef: "S",
          GPSLatitude: "33/1 52/1 1234/100",
          GPSLongitudeRef: "E",
          GPSLongitude: "151/1 12/1 3456/100",
        },
      })
      // EXIF orientation 6: the camera was held upright, the sensor wrote the pixels sideways.
      .withMetadata({ orientation: 6 })
      .toBuffer();
    const before = await sharp(original).metadata();
    expect(hasGpsPointer(before.exif)).toBe(true);
    expect(original.includes(Buffer.from("Phonemaker"))).toBe(true);

    const uploaded = await upload(original, "gauges.jpg");
    expect(uploaded.status).toBe(201);
    const served = await technician.get(uploaded.body.photo.url).buffer(true);
    expect(served.status).toBe(200);
    expect(served.headers["content-type"]).toBe("image/jpeg");
    const after = await sharp(served.body).metadata();
    expect(after.exif).toBeUndefined();
    expect(after.xmp).toBeUndefined();
    expect(served.body.includes(Buffer.from("Phonemaker"))).toBe(false);
    // Upright without the tag: the pixels were turned, 400 × 200 became 200 × 400.
    expect(after.orientation).toBeUndefined();
    expect([after.width, after.height]).toEqual([200, 400]);
    expect(uploaded.body.photo).toMatchObject({ kind: "gauges" });
  });

  it("refuses a photo of more than 50 megapixels with 422 before decoding it", async () => {
    expect(MAX_PHOTO_PIXELS).toBe(50_000_000);
    const bomb = await pngClaiming(16_000, 16_000);
    expect(bomb.length).toBeLessThan(200);
    const response = await upload(bomb, "huge.png");
    expect(response.status).toBe(422);
    expect(response.body.message).toMatch(/16000 × 16000 pixels \(256 megapixels\).*up to 50 megapixels/);
    // Just over the limit is refused too.
    expect((await upload(await pngClaiming(7072, 7071), "just-over.png")).status).toBe(422);
  });

  it("refuses a PNG whose header is valid but whose data is cut off (400, not 500)", async () => {
    const noise = Buffer.alloc(300 * 200 * 3);
    for (let index = 0; index < noise.length; index++) noise[index] = (index * 7919) % 251;
    const png = await sharp(noise, { raw: { width: 300, height: 200, channels: 3 } })
      .png()
      .toBuffer();
    const cut = png.subarray(0, Math.floor(png.length / 2));
    expect((await sharp(cut).metadata()).width).toBe(300);
    const response = await upload(cut, "cut.png");
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(/damaged or incomplete/);
  });

  it("serves the original and the thumbnail with their type, a private day's cache, a length and an ETag", async () => {
    const uploaded = await upload(await smallJpeg(), "gauges.jpg");
    expect(uploaded.status).toBe(201);
    const original = await technician.get(uploaded.body.photo.url).buffer(true);
    const thumbnail = await technician.get(uploaded.body.photo.thumbnailUrl).buffer(true);
    for (const [served, type] of [
      [original, "image/jpeg"],
      [thumbnail, "image/webp"],
    ] as const) {
      expect(served.status).toBe(200);
      expect(served.headers["content-type"]).toBe(type);
      expect(served.headers["cache-control"]).toBe("private, max-age=86400");
      expect(Number(served.headers["content-length"])).toBe(served.body.length);
      expect(served.headers["etag"]).toMatch(/^W\/"/);
    }
    expect((await sharp(original.body).metadata()).format).toBe("jpeg");
    expect((await sharp(thumbnail.body).metadata()).format).toBe("webp");
    // The bytes are kept under the names the row holds, and nothing else is written.
    const row = await photoRow(uploaded.body.photo.id);
    expect(await photoStore.storedNames()).toEqual(expect.arrayContaining([row.storedName, row.thumbnailName]));
  });

  it("answers 404 for a photo whose bytes are no longer in the store", async () => {
    const uploaded = await upload(await smallJpeg(), "gauges.jpg");
    const row = await photoRow(uploaded.body.photo.id);
    await testApp.photoStore.delete(row.storedName);
    const missing = await technician.get(uploaded.body.photo.url);
    expect(missing.status).toBe(404);
    expect(missing.body.message).toBe("Photo not found");
    // The thumbnail is still there and still served.
    expect((await technician.get(uploaded.body.photo.thumbnailUrl)).status).toBe(200);
  });

  it("keeps one original and one thumbnail for a photo sent twice at once", async () => {
    const picture = await smallJpeg();
    const before = await photoStore.storedNames();
    const clientId = randomUUID();
    const send = () =>
      technician
        .post(`/api/visits/${visitId}/photos`)
        .field("kind", "gauges")
        .field("clientId", clientId)
        .attach("photo", picture, "gauges.jpg")
        .then((response) => response);
    const [first, second] = await Promise.all([send(), send()]);
    expect([first.status, second.status]).toEqual([201, 201]);
    expect(second.body.photo.id).toBe(first.body.photo.id);
    // Whichever send lost the race removed what it had written.
    const row = await photoRow(first.body.photo.id);
    const added = (await photoStore.storedNames()).filter((name) => !before.includes(name));
    expect(added.sort()).toEqual([row.storedName, row.thumbnailName].sort());
  });

  it("keeps nothing of a photo refused for what it is", async () => {
    const before = await photoStore.storedNames();
    expect((await upload(Buffer.from("not an image"), "evil.jpg")).status).toBe(415);
    expect(await photoStore.storedNames()).toEqual(before);
  });
});
