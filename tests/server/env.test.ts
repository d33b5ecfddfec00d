import { describe, expect, it } from "vitest";
import { readEnv } from "@server/env.ts";

const BASE = { NODE_ENV: "test", DATA_DIR: "memory://" };
const failure = (env: Record<string, string>) => {
  try {
    readEnv({ ...BASE, ...env });
  } catch (error) {
    return (error as Error).message;
  }
  throw new Error("readEnv accepted the environment");
};

describe("readEnv: the photo store", () => {
  it("keeps photos in UPLOADS_DIR unless told otherwise", () => {
    expect(readEnv({ ...BASE, UPLOADS_DIR: "/srv/photos" }).photoStore).toEqual({
      kind: "local",
      folder: "/srv/photos",
    });
  });

  it("refuses PHOTO_STORE=s3 without a bucket, naming S3_BUCKET", () => {
    expect(failure({ PHOTO_STORE: "s3" })).toContain("S3_BUCKET: is required when PHOTO_STORE is s3");
  });

  it("refuses a bucket name S3 would refuse", () => {
    expect(failure({ PHOTO_STORE: "s3", S3_BUCKET: "Satura_Photos" })).toContain(
      "S3_BUCKET: must be 3–63 lowercase letters, digits, dots or hyphens",
    );
  });

  it("refuses one S3 key without the other, naming the missing one and never the secret", () => {
    expect(failure({ PHOTO_STORE: "s3", S3_BUCKET: "photos", S3_ACCESS_KEY_ID: "AKIA" })).toContain(
      "S3_SECRET_ACCESS_KEY: is required with the other S3 key",
    );
    const message = failure({ PHOTO_STORE: "s3", S3_BUCKET: "photos", S3_SECRET_ACCESS_KEY: "very-secret-value" });
    expect(message).toContain("S3_ACCESS_KEY_ID: is required with the other S3 key");
    expect(message).not.toContain("very-secret-value");
  });

  it("uses path-style addressing with an endpoint of its own, the host name on AWS", () => {
    const compatible = readEnv({ ...BASE, PHOTO_STORE: "s3", S3_BUCKET: "photos", S3_ENDPOINT: "http://minio:9000" });
    expect(compatible.photoStore).toEqual({
      kind: "s3",
      bucket: "photos",
      endpoint: "http://minio:9000",
      region: "us-east-1",
      forcePathStyle: true,
      credentials: undefined,
    });
    const aws = readEnv({
      ...BASE,
      PHOTO_STORE: "s3",
      S3_BUCKET: "photos",
      S3_REGION: "eu-central-1",
      S3_ACCESS_KEY_ID: "AKIA",
      S3_SECRET_ACCESS_KEY: "secret",
    });
    expect(aws.photoStore).toMatchObject({ endpoint: undefined, region: "eu-central-1", forcePathStyle: false });
    expect(aws.photoStore).toHaveProperty("credentials", { accessKeyId: "AKIA", secretAccessKey: "secret" });
    expect(
      readEnv({
        ...BASE,
        PHOTO_STORE: "s3",
        S3_BUCKET: "photos",
        S3_ENDPOINT: "http://r2:1",
        S3_FORCE_PATH_STYLE: "false",
      }).photoStore,
    ).toMatchObject({ forcePathStyle: false });
  });
});
