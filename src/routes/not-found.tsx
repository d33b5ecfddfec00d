import { Link, useLocation } from "react-router-dom";

export default function NotFoundRoute() {
  const location = useLocation();
  return (
    <div className="space-y-3">
      <h1 className="text-2xl font-semibold">Page not found</h1>
      <p>
        Nothing lives at <span className="num">{location.pathname}</span>.
      </p>
      <Link
        to="/"
        className="inline-flex min-h-touch items-center rounded-card bg-accent px-4 font-medium text-accent-ink"
      >
        Back to Today
      </Link>
    </div>
  );
}
