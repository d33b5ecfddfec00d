import { randomBytes } from "node:crypto";
import { mkdir, readFile, rm, writeFile } from "node:fs/promises";
import { join } from "node:path";
import sharp from "sharp";
import { HttpError } from "../http/http-error.ts";

/** Photos larger than this are refused: a phone camera JPEG is 2–6 MB. */
export const MAX_PHOTO_BYTES = 12 * 1024 * 1024;
const THUMBNAIL_WIDTH = 320;

/** What the content says the file is; the name and the browser's type are not trusted. */
const ACCEPTED_FORMATS: Record<string, string> = { jpeg: "image/jpeg", png: "image/png", webp: "image/webp" };

export interface StoredPhoto {
  storedName: string;
  thumbnailName: string;
  mimeType: string;
  bytes: number;
}

/**
 * Checks an upload by decoding it (not by its extension), then writes the original and a
 * small WebP thumbnail under random names, so a file name can never steer where it goes.
 */
export async function storePhoto(folder: string, buffer: Buffer): Promise<StoredPhoto> {
  let format: string | undefined;
  try {
    format = (await sharp(buffer).metadata()).format;
  } catch {
    format = undefined;
  }
  const mimeType = format ? ACCEPTED_FORMATS[format] : undefined;
  if (!mimeType) throw new HttpError(415, "That file is not a JPEG, PNG or WebP photo");

  await mkdir(folder, { recursive: true });
  const base = randomBytes(16).toString("hex");
  const storedName = `${base}.${format === "jpeg" ? "jpg" : format}`;
  const thumbnailName = `${base}-thumb.webp`;
  // rotate() applies the camera's EXIF orientation so gauges are not shown sideways.
  const thumbnail = await sharp(buffer).rotate().resize({ width: THUMBNAIL_WIDTH, withoutEnlargement: true }).webp({ quality: 70 }).toBuffer();
  await writeFile(join(folder, storedName), buffer);
  await writeFile(join(folder, thumbnailName), thumbnail);
  return { storedName, thumbnailName, mimeType, bytes: buffer.length };
}

export function readPhoto(folder: string, name: string): Promise<Buffer> {
  // Names come from the database, never from the request; still refuse anything path-like.
  if (!/^[a-f0-9]{32}(-thumb)?\.(jpg|png|webp)$/.test(name)) throw new HttpError(404, "Photo not found");
  return readFile(join(folder, name));
}

/** Removes the files of a photo that was refused after they were written (its visit closed meanwhile). */
export async function discardPhoto(folder: string, photo: Pick<StoredPhoto, "storedName" | "thumbnailName">): Promise<void> {
  await Promise.all([photo.storedName, photo.thumbnailName].map((name) => rm(join(folder, name), { force: true })));
}
