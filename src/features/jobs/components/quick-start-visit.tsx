import { Play } from "lucide-react";
import { useDeferredValue, useId, useState } from "react";
import { Link, useNavigate } from "react-router-dom";
import type { Equipment } from "@shared/schemas/equipment.ts";
import type { VisitSummary } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useEquipmentList } from "@/lib/api/equipment.ts";
import { useCreateVisit } from "@/lib/api/visits.ts";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";

/** A phone shows about this many rows above the keyboard; more means the search needs another word. */
const MAX_SHOWN = 5;

/**
 * Find a unit by name, site or customer and start a visit on it from Today, in one tap. The
 * reason can wait: it is asked for before the visit goes for review. `matches` is the
 * equipment list's own search (passed in by the route, so there is one way to match a unit).
 * A unit that already has a visit in progress offers that visit instead: two open visits on
 * one unit would split its readings and trend.
 */
export function QuickStartVisit({
  matches,
  inProgress,
}: {
  matches: (unit: Equipment, query: string) => boolean;
  inProgress: VisitSummary[] | undefined;
}) {
  const equipment = useEquipmentList();
  const create = useCreateVisit();
  const navigate = useNavigate();
  const [query, setQuery] = useState("");
  const deferredQuery = useDeferredValue(query.trim());
  const [error, setError] = useState<string | null>(null);
  const [starting, setStarting] = useState<string | null>(null);
  const searchId = useId();
  const found = deferredQuery && equipment.data ? equipment.data.filter((unit) => matches(unit, deferredQuery)) : [];

  const openVisit = (unit: Equipment) => inProgress?.find((visit) => visit.equipmentId === unit.id);

  const start = async (unit: Equipment) => {
    setError(null);
    setStarting(unit.id);
    try {
      const visit = await create.mutateAsync({ equipmentId: unit.id });
      navigate(paths.visits.detail.getHref(visit.id));
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The visit was not started. Try again.");
      setStarting(null);
    }
  };

  return (
    <section aria-labelledby={`${searchId}-heading`} className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 id={`${searchId}-heading`} className="text-lg font-semibold">
        Start a visit
      </h2>
      <label htmlFor={searchId} className="mt-1 block text-muted">
        Find the unit by its name, site or customer
      </label>
      <SearchInput id={searchId} value={query} onChange={setQuery} placeholder="e.g. rooftop, Wattle Lane" />
      {equipment.isError && <FormAlert>{equipment.error.message}</FormAlert>}
      {error && (
        <div className="mt-2">
          <FormAlert>{error}</FormAlert>
        </div>
      )}
      {deferredQuery &&
        (equipment.isPending ? (
          <p className="mt-2 text-muted">Loading the units…</p>
        ) : found.length === 0 ? (
          <p className="mt-2" aria-live="polite">
            No unit matches “{deferredQuery}”. Try another word, or add the unit under Equipment.
          </p>
        ) : (
          <>
            <ul className="mt-2 divide-y-2 divide-rule" aria-label="Units found">
              {found.slice(0, MAX_SHOWN).map((unit) => (
                <li key={unit.id} className="flex flex-wrap items-center gap-3 py-2">
                  <div className="min-w-0 flex-1">
                    <p className="font-medium">{unit.name}</p>
                    <p className="truncate text-sm text-muted">
                      {unit.customerName} · {unit.siteName} · <span className="num">{unit.refrigerant}</span>
                    </p>
                  </div>
                  {openVisit(unit) ? (
                    <Link
                      to={paths.visits.detail.getHref(openVisit(unit)!.id)}
                      className="inline-flex min-h-touch items-center gap-2 rounded-card border-2 border-ink px-4 font-semibold"
                      aria-label={`Continue the visit in progress on ${unit.name}`}
                    >
                      <Play aria-hidden className="size-5" /> Continue visit
                    </Link>
                  ) : (
                    <Button onClick={() => void start(unit)} disabled={create.isPending} aria-label={`Start a visit on ${unit.name}`}>
                      <Play aria-hidden className="size-5" /> {starting === unit.id ? "Starting…" : "Start visit"}
                    </Button>
                  )}
                </li>
              ))}
            </ul>
            {found.length > MAX_SHOWN && (
              <p className="text-sm text-muted">
                {found.length - MAX_SHOWN} more: add a word to narrow the search.
              </p>
            )}
            <p className="mt-1 text-sm text-muted">The reason for the visit can wait: you give it before you submit for review.</p>
          </>
        ))}
    </section>
  );
}
