import { randomBytes } from "node:crypto";
import { preparePhoto } from "./prepare-photo.ts";
import type { PhotoStore } from "./photo-store.ts";

export interface StoredPhoto {
  storedName: string;
  thumbnailName: string;
  mimeType: string;
  bytes: number;
}

/** The names storePhoto gives: 32 hex digits, "-thumb" for the thumbnail, the format's extension. */
const PHOTO_NAME = /^[a-f0-9]{32}(-thumb)?\.(jpg|png|webp)$/;

/**
 * Checks an upload (preparePhoto), then keeps the original and its thumbnail under random names,
 * so a file name sent by a client can never steer where a photo goes.
 *
 * @throws HttpError 415, 422 or 400 from preparePhoto when the upload is not a photo Satura takes
 */
export async function storePhoto(store: PhotoStore, buffer: Buffer): Promise<StoredPhoto> {
  const prepared = await preparePhoto(buffer);
  const base = randomBytes(16).toString("hex");
  const stored = {
    storedName: `${base}.${prepared.extension}`,
    thumbnailName: `${base}-thumb.webp`,
    mimeType: prepared.mimeType,
    bytes: prepared.original.length,
  };
  try {
    await Promise.all([
      store.put(stored.storedName, prepared.original, prepared.mimeType),
      store.put(stored.thumbnailName, prepared.thumbnail, "image/webp"),
    ]);
  } catch (error) {
    // Half a photo is nobody's: the half that was written goes too.
    await discardPhoto(store, stored).catch(() => undefined);
    throw error;
  }
  return stored;
}

/** A stored photo's bytes, or null when the name is not one storePhoto gives or nothing is kept under it. */
export async function readPhoto(store: PhotoStore, name: string): Promise<Buffer | null> {
  // Names come from the database, never from the request; still refuse anything path-like.
  if (!PHOTO_NAME.test(name)) return null;
  return store.get(name);
}

/** Removes the files of a photo that was refused after they were written (its visit closed meanwhile). */
export async function discardPhoto(
  store: PhotoStore,
  photo: Pick<StoredPhoto, "storedName" | "thumbnailName">,
): Promise<void> {
  await Promise.all([photo.storedName, photo.thumbnailName].map((name) => store.delete(name)));
}
