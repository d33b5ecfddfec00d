/** An error with an HTTP status and a message that is safe to show the user. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string>,
    /** What went wrong underneath (logged with a 5xx, never sent). */
    options?: ErrorOptions,
  ) {
    super(message, options);
    this.name = "HttpError";
  }
}

export const notFound = (what = "Record") => new HttpError(404, `${what} not found`);
