/**
 * Two app servers on one PostgreSQL and one S3-compatible photo store (issue 20, docs/deploy.md):
 * real server processes, as a load balancer would see them. Whatever one server accepts, the
 * other must honour: the session, the reading a reviewer waits for, the photo, the throttle.
 *
 * Runs in the PostgreSQL pass (`npm run test:server:pg`, which sets TEST_DATABASE_URL); on the
 * embedded database alone there is no second server to start, so it says so and skips.
 */
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_AUTH_LIMITS } from "@server/auth/rate-limits.ts";
import { SESSION_COOKIE_NAME } from "@server/auth/lucia.ts";
import { LIVE_REFRESH_MS } from "@/lib/api/visits.ts";
import { READING_BODY } from "../../bench/api/save-reading.ts";
import { startServer, DEMO_PASSWORD, type BenchServer } from "../../bench/api/server-process.ts";
import { startS3TestStore, type TestPhotoStore } from "../setup/photo-stores.ts";
import { databaseUrl, dropDatabase, onServer } from "../../scripts/local-servers/postgres-admin.ts";

const adminUrl = process.env.TEST_DATABASE_URL;
if (!adminUrl) {
  console.info(
    "two-servers.test.ts skipped: TEST_DATABASE_URL is not set. It runs in the PostgreSQL pass (npm run test:server:pg).",
  );
}

const TECHNICIAN = "tech@bellbird.example";
const SENIOR = "senior@bellbird.example";
const OWNER = "owner@bellbird.example";
/** Both servers start the real server/index.ts: tsx, every refrigerant's table, migrations. */
const START_TIMEOUT_MS = 120_000;

/** One server's requests as one person (cookie), with the Origin each write must carry. */
function as(server: BenchServer, cookie: string) {
  const headers = (extra: Record<string, string> = {}) => ({ cookie, origin: server.origin, ...extra });
  return {
    get: (path: string, extra?: Record<string, string>) =>
      fetch(`${server.origin}${path}`, { headers: headers(extra) }),
    post: (path: string, body: unknown) =>
      fetch(`${server.origin}${path}`, {
        method: "POST",
        headers: headers({ "content-type": "application/json" }),
        body: JSON.stringify(body),
      }),
    upload: (path: string, form: FormData) =>
      fetch(`${server.origin}${path}`, { method: "POST", headers: headers(), body: form }),
  };
}

function signInAttempt(server: BenchServer, email: string, password: string) {
  return fetch(`${server.origin}/api/auth/sign-in`, {
    method: "POST",
    // The test talks to both servers from 127.0.0.1, a trusted proxy by default (TRUST_PROXY):
    // one client address for both, as behind one load balancer.
    headers: { "content-type": "application/json", origin: server.origin, "x-forwarded-for": "198.51.100.23" },
    body: JSON.stringify({ email, password }),
  });
}

describe.skipIf(!adminUrl)("two app servers on one PostgreSQL and one S3 store", () => {
  const databaseName = `satura_two_servers_${process.pid}`;
  let photos: TestPhotoStore;
  let first: BenchServer;
  let second: BenchServer;

  beforeAll(async () => {
    await dropDatabase(adminUrl!, databaseName);
    await onServer(adminUrl!, `create database ${databaseName}`);

    photos = await startS3TestStore();
    const env = { DATABASE_URL: databaseUrl(adminUrl!, databaseName), ...photos.env };
    // Both start together on the empty database: one migrates and loads the demo company under
    // the start-up lock, the other waits for it and then finds both done.
    [first, second] = await Promise.all([
      startServer("memory://", { ...env, DEMO_DATA: "true" }),
      startServer("memory://", { ...env, DEMO_DATA: "true" }),
    ]);
  }, START_TIMEOUT_MS);

  afterAll(async () => {
    await Promise.all([first?.stop(), second?.stop()]);
    await photos?.close();
    await dropDatabase(adminUrl!, databaseName);
  });

  it("both are ready: each reaches the database and the photo store", async () => {
    for (const server of [first, second]) {
      const ready = await fetch(`${server.origin}/api/ready`);
      expect(ready.status).toBe(200);
    }
  });

  it("loaded the demo company once, though both started on the empty database", async () => {
    const owner = as(second, await second.signIn(OWNER));
    const units = (await (await owner.get("/api/equipment")).json()) as { equipment: { name: string }[] };
    const names = units.equipment.map((unit) => unit.name);
    expect(names.length).toBeGreaterThan(0);
    expect(new Set(names).size).toBe(names.length);
  });

  it("honours a session made on the other server, and its sign-out", async () => {
    const cookie = await first.signIn(TECHNICIAN);
    const me = await as(second, cookie).get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(((await me.json()) as { user: { email: string } }).user.email).toBe(TECHNICIAN);

    expect((await as(first, cookie).post("/api/auth/sign-out", {})).status).toBeLessThan(300);
    // Signed out on one server is signed out on all, at once: no server may keep it alive.
    expect((await as(second, cookie).get("/api/auth/me")).status).toBe(401);
  });

  it("shows a reading saved through one server in a review read through the other within the refresh interval", async () => {
    const technician = as(first, await first.signIn(TECHNICIAN));
    const senior = as(second, await second.signIn(SENIOR));
    const units = (await (await technician.get("/api/equipment")).json()) as {
      equipment: { id: string; refrigerant: string }[];
    };
    const unit = units.equipment.find((candidate) => candidate.refrigerant === "R407C")!;
    const opened = await technician.post("/api/visits", { equipmentId: unit.id, reason: "Two-server check" });
    expect(opened.status).toBe(201);
    const visitId = ((await opened.json()) as { visit: { id: string } }).visit.id;

    // The reviewer holds the visit as it was, as the review screen does between refreshes.
    const before = await senior.get(`/api/visits/${visitId}`);
    expect(before.status).toBe(200);
    const etag = before.headers.get("etag")!;
    await before.arrayBuffer();

    const saved = await technician.post(`/api/visits/${visitId}/readings`, READING_BODY);
    expect(saved.status).toBe(201);
    const readingId = ((await saved.json()) as { reading: { id: string } }).reading.id;
    const savedAt = Date.now();

    // The review's next refresh (a conditional request) must see it: no 304 from a stale copy.
    let seen: string | undefined;
    while (Date.now() - savedAt < LIVE_REFRESH_MS) {
      const refresh = await senior.get(`/api/visits/${visitId}`, { "if-none-match": etag });
      if (refresh.status === 200) {
        seen = await refresh.text();
        if (seen.includes(readingId)) break;
      } else await refresh.arrayBuffer();
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    expect(seen).toContain(readingId);
  });

  it("serves a photo uploaded through one server from the other, byte for byte", async () => {
    const technician = as(first, await first.signIn(TECHNICIAN));
    const units = (await (await technician.get("/api/equipment")).json()) as { equipment: { id: string }[] };
    const opened = await technician.post("/api/visits", { equipmentId: units.equipment[0]!.id, reason: "Photo check" });
    const visitId = ((await opened.json()) as { visit: { id: string } }).visit.id;
    const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#4a7" } })
      .jpeg()
      .toBuffer();
    const form = new FormData();
    form.set("kind", "gauges");
    form.set("photo", new Blob([new Uint8Array(jpeg)], { type: "image/jpeg" }), "gauges.jpg");
    const uploaded = await technician.upload(`/api/visits/${visitId}/photos`, form);
    expect(uploaded.status).toBe(201);
    const photoId = ((await uploaded.json()) as { photo: { id: string } }).photo.id;

    const seniorOnSecond = as(second, await second.signIn(SENIOR));
    const original = await seniorOnSecond.get(`/api/photos/${photoId}`);
    expect(original.status).toBe(200);
    expect(original.headers.get("content-type")).toBe("image/jpeg");
    const served = Buffer.from(await original.arrayBuffer());
    // Stored re-encoded (metadata dropped, photos.test.ts): the same picture, 64 × 48.
    expect(await sharp(served).metadata()).toMatchObject({ format: "jpeg", width: 64, height: 48 });
    const onFirst = Buffer.from(
      await (await as(first, await first.signIn(SENIOR)).get(`/api/photos/${photoId}`)).arrayBuffer(),
    );
    expect(served.equals(onFirst)).toBe(true);
    expect((await seniorOnSecond.get(`/api/photos/${photoId}/thumbnail`)).status).toBe(200);
  });

  it("counts failed sign-ins across both servers: the limit holds wherever the attempts land", async () => {
    const limit = DEFAULT_AUTH_LIMITS.signInFailuresPerAccountAndClient;
    for (let attempt = 0; attempt < limit; attempt++) {
      const server = attempt % 2 === 0 ? first : second;
      expect((await signInAttempt(server, OWNER, "not-the-password")).status).toBe(401);
    }
    // Even the right password is refused now, on either server.
    for (const server of [first, second]) {
      const refused = await signInAttempt(server, OWNER, DEMO_PASSWORD);
      expect(refused.status).toBe(429);
      expect(refused.headers.getSetCookie().some((value) => value.startsWith(`${SESSION_COOKIE_NAME}=`))).toBe(false);
    }
  });
});
