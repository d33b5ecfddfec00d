import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { readEnv } from "@server/env.ts";
import { createPhotoStore } from "@server/photos/create-photo-store.ts";
import { createLocalPhotoStore } from "@server/photos/local-photo-store.ts";
import { photoStoreReadinessCheck, type PhotoStore } from "@server/photos/photo-store.ts";
import { PHOTO_STORES, startS3TestStore, TEST_BUCKET, type TestPhotoStore } from "../../setup/photo-stores.ts";

/** The store the server would open with these variables. */
const storeFor = (env: Record<string, string>) =>
  createPhotoStore(readEnv({ NODE_ENV: "test", DATA_DIR: "memory://", ...env }).photoStore);

const NAME = "0123456789abcdef0123456789abcdef.jpg";
const BYTES = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 0xff, 0xd9]);

describe.each(PHOTO_STORES)("photo store: $store", ({ start }) => {
  let testStore: TestPhotoStore;
  let store: PhotoStore;

  beforeAll(async () => {
    testStore = await start();
    store = await storeFor(testStore.env);
  });
  afterAll(async () => {
    store?.close();
    await testStore?.close();
  });

  it("gives back the bytes it was given, and nothing once they are deleted", async () => {
    await store.put(NAME, BYTES, "image/jpeg");
    expect(await testStore.storedNames()).toEqual([NAME]);
    expect(await store.get(NAME)).toEqual(BYTES);
    await store.delete(NAME);
    expect(await store.get(NAME)).toBeNull();
    expect(await testStore.storedNames()).toEqual([]);
  });

  it("replaces what a name held", async () => {
    await store.put(NAME, BYTES, "image/jpeg");
    await store.put(NAME, Buffer.from("second"), "image/jpeg");
    expect((await store.get(NAME))?.toString()).toBe("second");
    await store.delete(NAME);
  });

  it("answers a name it never held with null, and deletes it without complaint", async () => {
    expect(await store.get("ffffffffffffffffffffffffffffffff-thumb.webp")).toBeNull();
    await expect(store.delete("ffffffffffffffffffffffffffffffff-thumb.webp")).resolves.toBeUndefined();
  });

  it("is ready, and its readiness check says so", async () => {
    await expect(store.check()).resolves.toBeUndefined();
    const readiness = photoStoreReadinessCheck(store);
    expect(readiness.name).toBe("photo store");
    await expect(readiness.check()).resolves.toBeUndefined();
  });
});

describe("photo store: readiness failures", () => {
  it("names a local folder that cannot be written", async () => {
    const parent = await mkdtemp(join(tmpdir(), "satura-not-a-folder-"));
    const file = join(parent, "uploads");
    await writeFile(file, "a file where the folder should be");
    try {
      await expect(createLocalPhotoStore(file).check()).rejects.toThrow(
        `photo folder ${file} cannot be written (EEXIST)`,
      );
    } finally {
      await rm(parent, { recursive: true, force: true });
    }
  });

  it("says the bucket does not exist, naming it and the endpoint", async () => {
    const empty = await startS3TestStore({ withoutBucket: true });
    const store = await storeFor(empty.env);
    try {
      await expect(store.check()).rejects.toThrow(
        `bucket "${TEST_BUCKET}" at ${empty.env.S3_ENDPOINT} does not exist: create it, or set S3_BUCKET to one that does`,
      );
    } finally {
      store.close();
      await empty.close();
    }
  });

  it("says the endpoint cannot be reached when nothing answers there, without the secret", async () => {
    // A fake started and stopped again: its port is now closed.
    const stopped = await startS3TestStore();
    await stopped.close();
    const store = await storeFor(stopped.env);
    try {
      const failure = await store.check().then(
        () => null,
        (error: Error) => error,
      );
      expect(failure?.message).toBe(
        `bucket "${TEST_BUCKET}" at ${stopped.env.S3_ENDPOINT} cannot be reached (ECONNREFUSED)`,
      );
      expect(failure?.message).not.toContain(stopped.env.S3_SECRET_ACCESS_KEY);
    } finally {
      store.close();
    }
  });

  it("says access was refused when the keys are wrong", async () => {
    const s3 = await startS3TestStore();
    const store = await storeFor({ ...s3.env, S3_ACCESS_KEY_ID: "WRONG", S3_SECRET_ACCESS_KEY: "not-the-secret" });
    try {
      await expect(store.check()).rejects.toThrow(/refused access: check S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY/);
    } finally {
      store.close();
      await s3.close();
    }
  });
});
