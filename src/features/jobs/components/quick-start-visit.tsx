import { Play } from "lucide-react";
import { useId, useState } from "react";
import { Link, useNavigate } from "react-router-dom";
import type { Equipment } from "@shared/schemas/equipment.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useDebouncedValue } from "@/hooks/use-debounced-value.ts";
import { useEquipmentList } from "@/lib/api/equipment.ts";
import { useCreateVisit, useVisits } from "@/lib/api/visits.ts";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";

/** A phone shows about this many rows above the keyboard; more means the search needs another word. */
const MAX_SHOWN = 5;

/**
 * One unit found: "Continue visit" when it already has a visit in progress (two open visits on
 * one unit would split its readings and trend), else "Start visit". The server answers for
 * this unit alone, so the answer holds however many visits the company has open.
 */
function FoundUnit({
  unit,
  starting,
  disabled,
  onStart,
}: {
  unit: Equipment;
  starting: boolean;
  disabled: boolean;
  onStart: (unit: Equipment) => void;
}) {
  const inProgress = useVisits({ equipmentId: unit.id, status: "open,sent-back", limit: 1 });
  const visit = inProgress.data?.visits[0];
  return (
    <li className="flex flex-wrap items-center gap-3 py-2">
      <div className="min-w-0 flex-1">
        <p className="font-medium">{unit.name}</p>
        <p className="truncate text-sm text-muted">
          {unit.customerName} · {unit.siteName} · <span className="num">{unit.refrigerant}</span>
        </p>
      </div>
      {visit ? (
        <Link
          to={paths.visits.detail.getHref(visit.id)}
          className="inline-flex min-h-touch items-center gap-2 rounded-card border-2 border-ink px-4 font-semibold"
          aria-label={`Continue the visit in progress on ${unit.name}`}
        >
          <Play aria-hidden className="size-5" /> Continue visit
        </Link>
      ) : (
        <Button
          onClick={() => onStart(unit)}
          disabled={disabled || inProgress.isPending}
          aria-label={`Start a visit on ${unit.name}`}
        >
          <Play aria-hidden className="size-5" /> {starting ? "Starting…" : "Start visit"}
        </Button>
      )}
    </li>
  );
}

/**
 * Find a unit by name, site or customer and start a visit on it from Today, in one tap. The
 * reason can wait: it is asked for before the visit goes for review. The server searches the
 * way the equipment list does (one way to find a unit), a moment after typing stops.
 */
export function QuickStartVisit() {
  const create = useCreateVisit();
  const navigate = useNavigate();
  const [query, setQuery] = useState("");
  const search = useDebouncedValue(query.trim());
  const found = useEquipmentList({ q: search, limit: MAX_SHOWN }, { enabled: search !== "" });
  const [error, setError] = useState<string | null>(null);
  const [starting, setStarting] = useState<string | null>(null);
  const searchId = useId();
  const typing = query.trim() !== search;
  const units = found.data?.equipment ?? [];

  const start = async (unit: Equipment) => {
    setError(null);
    setStarting(unit.id);
    try {
      const visit = await create.mutateAsync({ equipmentId: unit.id });
      void navigate(paths.visits.detail.getHref(visit.id));
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
      {found.isError && <FormAlert>{found.error.message}</FormAlert>}
      {error && (
        <div className="mt-2">
          <FormAlert>{error}</FormAlert>
        </div>
      )}
      {query.trim() !== "" &&
        (typing || found.isPending || found.isPlaceholderData ? (
          <p className="mt-2 text-muted" role="status">
            Searching the units…
          </p>
        ) : found.isError ? null : units.length === 0 ? (
          <p className="mt-2" aria-live="polite">
            No unit matches “{search}”. Try another word, or add the unit under Equipment.
          </p>
        ) : (
          <>
            <ul className="mt-2 divide-y-2 divide-rule" aria-label="Units found">
              {units.map((unit) => (
                <FoundUnit
                  key={unit.id}
                  unit={unit}
                  starting={starting === unit.id}
                  disabled={create.isPending}
                  onStart={(chosen) => void start(chosen)}
                />
              ))}
            </ul>
            {found.data?.nextCursor && (
              <p className="text-sm text-muted">More units match: add a word to narrow the search.</p>
            )}
            <p className="mt-1 text-sm text-muted">
              The reason for the visit can wait: you give it before you submit for review.
            </p>
          </>
        ))}
    </section>
  );
}
