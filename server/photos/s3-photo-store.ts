import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import type { PhotoStore } from "./photo-store.ts";

export interface S3PhotoStoreSettings {
  bucket: string;
  /** An S3-compatible service's address (MinIO, Ceph, R2, s3rver); AWS's own when absent. */
  endpoint?: string;
  region: string;
  /** Bucket in the path (endpoint/bucket/key) rather than the host name: what most non-AWS services need. */
  forcePathStyle: boolean;
  /** Without them the SDK's default chain is used (AWS_* variables, an instance or task role). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
}

/**
 * An unreachable endpoint fails a request in seconds rather than holding it open: a photo
 * request waits at most this long for a connection, a readiness probe answers in time.
 */
const CONNECTION_TIMEOUT_MS = 3_000;
/** A 12 MB original on a slow link to the store still fits; a stalled transfer does not hang forever. */
const REQUEST_TIMEOUT_MS = 60_000;

const statusOf = (error: unknown) => (error instanceof S3ServiceException ? error.$metadata.httpStatusCode : undefined);

/**
 * Photos as objects in one bucket of S3-compatible storage, each under the same name a local
 * folder would give its file (no prefix), so a folder copied into a bucket reads as it is.
 */
export function createS3PhotoStore(settings: S3PhotoStoreSettings): PhotoStore {
  const { bucket, endpoint } = settings;
  const client = new S3Client({
    region: settings.region,
    endpoint,
    forcePathStyle: settings.forcePathStyle,
    credentials: settings.credentials,
    // Checksums only where S3 requires them: the SDK's newer default (a CRC32 on every upload)
    // is refused by several S3-compatible services, and photos are re-encoded, not archived.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    requestHandler: { connectionTimeout: CONNECTION_TIMEOUT_MS, requestTimeout: REQUEST_TIMEOUT_MS },
  });
  const where = `bucket "${bucket}"${endpoint ? ` at ${endpoint}` : ""}`;

  return {
    description: `S3 ${where}`,
    async put(name, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket: bucket, Key: name, Body: bytes, ContentType: contentType }));
    },
    async get(name) {
      try {
        const object = await client.send(new GetObjectCommand({ Bucket: bucket, Key: name }));
        if (!object.Body) return null;
        return Buffer.from(await object.Body.transformToByteArray());
      } catch (error) {
        // A missing key is a missing photo, as a missing file is in a folder; a missing bucket is not.
        if (error instanceof NoSuchKey) return null;
        throw error;
      }
    },
    async delete(name) {
      // S3 answers a delete of a key that is not there with success, as rm --force does.
      await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: name }));
    },
    async check() {
      try {
        await client.send(new HeadBucketCommand({ Bucket: bucket }));
      } catch (error) {
        throw new Error(checkFailure(where, error), { cause: error });
      }
    },
    close() {
      client.destroy();
    },
  };
}

/** Why the bucket cannot be used, in words an operator can act on; never a credential. */
function checkFailure(where: string, error: unknown): string {
  const status = statusOf(error);
  if (status === 404) return `${where} does not exist: create it, or set S3_BUCKET to one that does`;
  if (status === 403 || status === 401)
    return `${where} refused access: check S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, and the key's permissions`;
  if (status !== undefined) return `${where} answered ${status}`;
  const code = (error as NodeJS.ErrnoException | null)?.code;
  const reason = code ?? (error instanceof Error ? error.name : String(error));
  return `${where} cannot be reached (${reason})`;
}
