import type { RequestHandler } from "express";
import multer from "multer";
import { HttpError } from "./http-error.ts";

const MB = 1024 * 1024;

/**
 * One uploaded file in memory, under `field`, at most `maxBytes`. A file over the limit is
 * refused with 413 naming this upload's own limit (a CSV's 2 MB is not a photo's 12 MB).
 */
export function singleFileUpload(field: string, what: string, maxBytes: number): RequestHandler {
  const receive = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 10 },
  }).single(field);
  return (req, res, next) =>
    receive(req, res, (error: unknown) => {
      if (error instanceof multer.MulterError && error.code === "LIMIT_FILE_SIZE") {
        return next(
          new HttpError(413, `That ${what} is too large (${maxBytes / MB} MB at most)`, {
            [field]: `At most ${maxBytes / MB} MB`,
          }),
        );
      }
      next(error);
    });
}
