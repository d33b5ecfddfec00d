import type { ErrorRequestHandler, RequestHandler } from "express";
import multer from "multer";
import { ZodError } from "zod";
import { DiagnosisInputError } from "@shared/engine/index.ts";
import { fieldMessages } from "@shared/schemas/field-messages.ts";
import { uniqueViolation } from "../db/errors.ts";
import { HttpError } from "./http-error.ts";

/** The answer's headline: what an unknown field is, when there is one, else a general prompt. */
function validationMessage(error: ZodError): string {
  return error.issues.find((issue) => issue.code === "unrecognized_keys")?.message ?? "Some fields need attention";
}

/** Unknown /api paths answer JSON, never the client's index.html. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, `No API route for ${req.method} ${req.originalUrl}`));
};

/**
 * The one place errors become responses: every error is a JSON body with a message;
 * validation errors also list the fields. Unexpected errors are logged and answered
 * with a generic 500 so internals never leak to the client.
 */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  if (error instanceof ZodError) {
    res.status(400).json({ message: validationMessage(error), fields: fieldMessages(error) });
    return;
  }
  if (error instanceof DiagnosisInputError) {
    const fields = Object.fromEntries(
      Object.entries(error.fieldErrors).map(([field, messages]) => [field, messages[0] ?? "Check this value"]),
    );
    res.status(400).json({ message: error.formErrors[0] ?? "Some fields need attention", fields });
    return;
  }
  if (error instanceof multer.MulterError) {
    const tooLarge = error.code === "LIMIT_FILE_SIZE";
    res
      .status(tooLarge ? 413 : 400)
      .json({ message: tooLarge ? "That file is too large" : `Upload refused: ${error.message}` });
    return;
  }
  // Two requests raced past a route's own "is it taken?" check; the unique index held.
  if (uniqueViolation(error)) {
    res
      .status(409)
      .json({ message: "That record already exists: another request saved it a moment ago. Reload to see it." });
    return;
  }
  if (error instanceof HttpError) {
    // A refusal the server could not help (503 etc.) is logged with its cause; a 4xx is the client's.
    if (error.status >= 500) req.log?.error({ err: error.cause ?? error }, error.message);
    res.status(error.status).json({ message: error.message, ...(error.fields ? { fields: error.fields } : {}) });
    return;
  }
  // Errors raised by body-parser and multer carry their own status (413, 400 …).
  const status =
    typeof error?.status === "number" ? error.status : typeof error?.statusCode === "number" ? error.statusCode : 500;
  if (status >= 400 && status < 500) {
    const message =
      error?.type === "entity.too.large"
        ? "The request is too large"
        : error?.type === "entity.parse.failed"
          ? "The request body is not valid JSON"
          : String(error?.message ?? "Bad request");
    res.status(status).json({ message });
    return;
  }
  req.log?.error({ err: error }, "unhandled error");
  res.status(500).json({ message: "Something went wrong on the server. The error has been logged." });
};
