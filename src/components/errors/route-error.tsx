import { isRouteErrorResponse, Link, useRouteError } from "react-router-dom";
import { ApiError } from "@/lib/api/api-client.ts";

/** Shown in place of a screen that failed to load or render; the rest of the app stays usable. */
export function RouteError() {
  const error = useRouteError();
  const notFound =
    (isRouteErrorResponse(error) && error.status === 404) || (error instanceof ApiError && error.status === 404);
  const message = isRouteErrorResponse(error)
    ? error.statusText
    : error instanceof Error
      ? error.message
      : "Unknown error";
  return (
    <div role="alert" className="mx-auto max-w-xl space-y-3 p-6">
      <h1 className="text-2xl font-semibold">{notFound ? "Not found" : "This screen could not be shown"}</h1>
      <p>{notFound ? "The record or page you asked for does not exist, or you have no access to it." : message}</p>
      <div className="flex gap-3">
        <button
          type="button"
          onClick={() => window.location.reload()}
          className="min-h-touch rounded-card border-2 border-rule bg-surface px-4 font-medium"
        >
          Reload
        </button>
        <Link
          to="/"
          className="inline-flex min-h-touch items-center rounded-card bg-accent px-4 font-medium text-accent-ink"
        >
          Back to Today
        </Link>
      </div>
    </div>
  );
}
