import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { startFakeS3 } from "../../scripts/fake-s3.ts";

// The AWS SDK warns once per process that its 2027 releases will need Node 22; its documented
// switch (aws/aws-sdk-js-v3#7983) keeps that notice out of the test output. The server keeps it.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= "true";

export const TEST_BUCKET = "satura-test-photos";

/** A photo store for one test file: the variables that select it, what it holds, and a close. */
export interface TestPhotoStore {
  /** Extra environment for createTestApp / readEnv. */
  env: Record<string, string>;
  /** Every name kept in the store, sorted: what a test counts to see that nothing was left behind. */
  storedNames: () => Promise<string[]>;
  close: () => Promise<void>;
}

/** Photos in a fresh temporary folder: the default store. */
export async function startLocalTestStore(): Promise<TestPhotoStore> {
  const folder = await mkdtemp(join(tmpdir(), "satura-photos-"));
  return {
    env: { PHOTO_STORE: "local", UPLOADS_DIR: folder },
    storedNames: async () => (await readdir(folder).catch(() => [])).sort(),
    close: () => rm(folder, { recursive: true, force: true }),
  };
}

/** Photos in a bucket of an in-process s3rver on a free port, its files in a temporary folder. */
export async function startS3TestStore(options: { withoutBucket?: boolean } = {}): Promise<TestPhotoStore> {
  const directory = await mkdtemp(join(tmpdir(), "satura-s3-"));
  const fake = await startFakeS3({ directory, bucket: TEST_BUCKET, withoutBucket: options.withoutBucket });
  const client = new S3Client({
    endpoint: fake.endpoint,
    region: fake.env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: fake.env.S3_ACCESS_KEY_ID!, secretAccessKey: fake.env.S3_SECRET_ACCESS_KEY! },
  });
  return {
    env: fake.env,
    storedNames: async () => {
      const listed = await client.send(new ListObjectsV2Command({ Bucket: TEST_BUCKET }));
      return (listed.Contents ?? []).map((object) => object.Key ?? "").sort();
    },
    close: async () => {
      client.destroy();
      await fake.close();
      await rm(directory, { recursive: true, force: true });
    },
  };
}

/** Both stores, for tests that must pass the same on each: `describe.each(PHOTO_STORES)`. */
export const PHOTO_STORES = [
  { store: "local folder", start: startLocalTestStore },
  { store: "S3 (s3rver)", start: () => startS3TestStore() },
];
