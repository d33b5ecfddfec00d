import S3rver from "s3rver";

/** s3rver's one account: it checks request signatures against these keys. */
const FAKE_S3_KEY = "S3RVER";

export interface FakeS3Options {
  /** Buckets and objects are files under this folder. */
  directory: string;
  bucket: string;
  /** 0 picks a free port. */
  port?: number;
  /** Leave the bucket out (a test of a store whose bucket is missing). */
  withoutBucket?: boolean;
}

export interface FakeS3 {
  endpoint: string;
  /** The variables that point Satura's photo store at this fake (server/env.ts). */
  env: Record<string, string>;
  close: () => Promise<void>;
}

/**
 * An S3-compatible server in this process (s3rver, objects kept as files), for the tests and
 * `npm run dev:s3`: the photo store talks to it through the real AWS SDK, as to any S3 service.
 */
export async function startFakeS3(options: FakeS3Options): Promise<FakeS3> {
  const server = new S3rver({
    address: "127.0.0.1",
    port: options.port ?? 0,
    directory: options.directory,
    silent: true,
    configureBuckets: options.withoutBucket ? [] : [{ name: options.bucket, configs: [] }],
  });
  const { port } = await server.run();
  const endpoint = `http://127.0.0.1:${port}`;
  return {
    endpoint,
    env: {
      PHOTO_STORE: "s3",
      S3_BUCKET: options.bucket,
      S3_ENDPOINT: endpoint,
      S3_REGION: "us-east-1",
      S3_ACCESS_KEY_ID: FAKE_S3_KEY,
      S3_SECRET_ACCESS_KEY: FAKE_S3_KEY,
      S3_FORCE_PATH_STYLE: "true",
    },
    close: () => server.close(),
  };
}
