import { Link } from "react-router-dom";
import { paths } from "@/config/paths.ts";
import { useHealth } from "@/lib/api/health.ts";

export default function HomeRoute() {
  const health = useHealth();
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-3xl font-semibold">Today</h1>
        <p className="mt-1 max-w-prose text-muted">
          Readings in, saturation out: enter gauge pressures and line temperatures at the unit and Satura works out
          superheat, subcooling and what the circuit is telling you — and keeps the visit as a record.
        </p>
      </header>
      <section aria-labelledby="status-heading" className="rounded-card border-2 border-rule bg-surface p-4">
        <h2 id="status-heading" className="font-semibold">
          Connection
        </h2>
        {health.isPending && <p className="mt-1">Checking the server…</p>}
        {health.isError && (
          <p className="mt-1 font-medium text-fault" role="alert">
            ⚠ {health.error.message}
          </p>
        )}
        {health.isSuccess && (
          <p className="mt-1">
            ✓ Server and database answering <span className="num text-muted">(v{health.data.version})</span>
          </p>
        )}
      </section>
      <section className="rounded-card border-2 border-caution bg-surface p-4">
        <h2 className="font-semibold">Before you open a panel or a valve</h2>
        <p className="mt-1">
          Isolation, flammable refrigerants, nitrogen testing and recovery cylinders: read the{" "}
          <Link to={paths.safety.getHref()} className="font-medium text-accent underline underline-offset-4">
            safety notes
          </Link>
          .
        </p>
      </section>
    </div>
  );
}
