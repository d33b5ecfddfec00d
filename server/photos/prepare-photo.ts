import sharp, { type Metadata } from "sharp";
import { HttpError } from "../http/http-error.ts";

/** Photos larger than this are refused: a phone camera JPEG is 2–6 MB. */
export const MAX_PHOTO_BYTES = 12 * 1024 * 1024;
/**
 * Largest photo accepted, in pixels: 50 megapixels, the full resolution of today's largest
 * common phone sensors. Decoding takes 3–4 bytes a pixel, so a 12 MB file that claims
 * 16000 × 16000 pixels would need about 1 GB; sharp refuses to decode beyond this
 * (limitInputPixels, https://sharp.pixelplumbing.com/api-constructor).
 */
export const MAX_PHOTO_PIXELS = 50_000_000;
const THUMBNAIL_WIDTH = 320;
/** Re-encoding quality of the stored original: close to what a phone camera writes. */
const ORIGINAL_QUALITY = 90;

/** What the content says the file is; the name and the browser's type are not trusted. */
const ACCEPTED_FORMATS = { jpeg: "image/jpeg", png: "image/png", webp: "image/webp" } as const;
type AcceptedFormat = keyof typeof ACCEPTED_FORMATS;
const isAccepted = (format: string | undefined): format is AcceptedFormat =>
  format !== undefined && format in ACCEPTED_FORMATS;

/** A checked photo, ready to keep: the re-encoded original and its thumbnail. */
export interface PreparedPhoto {
  original: Buffer;
  /** A small WebP of the photo, for lists and previews. */
  thumbnail: Buffer;
  /** The original's file extension and content type, from what its content is. */
  extension: "jpg" | "png" | "webp";
  mimeType: (typeof ACCEPTED_FORMATS)[AcceptedFormat];
}

const megapixels = (pixels: number) => `${Math.round(pixels / 100_000) / 10} megapixels`;

/**
 * Checks an upload by decoding it (not by its extension), then makes the original to keep and a
 * small WebP thumbnail. Only buffers come out: where they are kept is the photo store's business.
 *
 * The stored original is decoded and encoded again rather than kept byte for byte: that drops
 * its metadata (EXIF with the GPS position and the phone's make and serial, XMP, IPTC), which
 * sharp leaves out of every output unless asked to keep it. rotate() first turns the pixels
 * upright by the EXIF orientation, so the photo still shows the right way up without it.
 *
 * @throws HttpError 415 when the content is not a JPEG, PNG or WebP, 422 when it has more than
 *   MAX_PHOTO_PIXELS pixels, 400 when it cannot be decoded to the end (cut off or damaged).
 */
export async function preparePhoto(buffer: Buffer): Promise<PreparedPhoto> {
  let metadata: Metadata | undefined;
  try {
    metadata = await sharp(buffer).metadata();
  } catch {
    metadata = undefined;
  }
  const format = metadata?.format;
  if (!metadata || !isAccepted(format)) throw new HttpError(415, "That file is not a JPEG, PNG or WebP photo");
  const pixels = (metadata.width ?? 0) * (metadata.height ?? 0);
  if (pixels > MAX_PHOTO_PIXELS) {
    throw new HttpError(
      422,
      `That photo is ${metadata.width} × ${metadata.height} pixels (${megapixels(pixels)}); Satura takes photos up to ${megapixels(MAX_PHOTO_PIXELS)}. Use the camera's normal setting, or make the photo smaller.`,
    );
  }

  let original: Buffer;
  let thumbnail: Buffer;
  try {
    const upright = sharp(buffer, { limitInputPixels: MAX_PHOTO_PIXELS }).rotate();
    const encoded = upright.clone();
    if (format === "jpeg") encoded.jpeg({ quality: ORIGINAL_QUALITY });
    else if (format === "webp") encoded.webp({ quality: ORIGINAL_QUALITY });
    else encoded.png();
    [original, thumbnail] = await Promise.all([
      encoded.toBuffer(),
      upright.clone().resize({ width: THUMBNAIL_WIDTH, withoutEnlargement: true }).webp({ quality: 70 }).toBuffer(),
    ]);
  } catch {
    // The header was readable but the pixels are not: a cut-off upload or a damaged file.
    throw new HttpError(
      400,
      "That photo could not be read to the end: the file is damaged or incomplete. Take or choose it again.",
    );
  }

  return { original, thumbnail, extension: format === "jpeg" ? "jpg" : format, mimeType: ACCEPTED_FORMATS[format] };
}
