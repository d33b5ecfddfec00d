import type { Env } from "../env.ts";
import { createLocalPhotoStore } from "./local-photo-store.ts";
import type { PhotoStore } from "./photo-store.ts";

/**
 * Opens the store PHOTO_STORE names (server/env.ts). The AWS SDK is loaded only for s3, so the
 * default local store starts without it.
 */
export async function createPhotoStore(settings: Env["photoStore"]): Promise<PhotoStore> {
  if (settings.kind === "local") return createLocalPhotoStore(settings.folder);
  const { createS3PhotoStore } = await import("./s3-photo-store.ts");
  return createS3PhotoStore(settings);
}
