/**
 * Where photo bytes are kept, apart from how they are checked (prepare-photo.ts) and named
 * (stored-photos.ts). Two implementations: a local folder (local-photo-store.ts, the default)
 * and S3-compatible object storage (s3-photo-store.ts); create-photo-store.ts picks one from
 * the environment. Decision 036 in the README.
 */
import type { ReadinessCheck } from "../routes/readiness.ts";

export interface PhotoStore {
  /** What the store is, for logs and readiness answers: never a credential. */
  readonly description: string;
  /** Keeps bytes under a name; an existing object of that name is replaced. */
  put(name: string, bytes: Buffer, contentType: string): Promise<void>;
  /** The bytes kept under a name, or null when there are none: the caller answers 404. */
  get(name: string): Promise<Buffer | null>;
  /** Removes a name; a name already gone is not an error. */
  delete(name: string): Promise<void>;
  /**
   * Resolves when the store can take and serve photos now; rejects with an Error whose message
   * says what is wrong (folder not writable, bucket missing, endpoint unreachable).
   */
  check(): Promise<void>;
  /** Lets go of connections (the S3 client's sockets); the store is not used afterwards. */
  close(): void;
}

/** The photo store's readiness check: can photos be written and read right now. */
export function photoStoreReadinessCheck(store: PhotoStore): ReadinessCheck {
  return { name: "photo store", check: () => store.check() };
}
