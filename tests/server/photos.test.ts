import { crc32 } from "node:zlib";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { MAX_PHOTO_PIXELS } from "@server/photos/photo-store.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

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

// Issue 13, item 8 (and the cut-off PNG of item 5).
describe("photo uploads", () => {
  let testApp: TestApp;
  let technician: Agent;
  let visitId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    const unit = (await technician.get("/api/equipment")).body.equipment[0];
    visitId = (await technician.post("/api/visits").send({ equipmentId: unit.id, reason: "Photo checks" })).body.visit
      .id;
  });
  afterAll(() => testApp.close());

  const upload = (photo: Buffer, name: string) =>
    technician.post(`/api/visits/${visitId}/photos`).field("kind", "gauges").attach("photo", photo, name);

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
});
