import { useDeferredValue, useId, useState } from "react";
import { Link } from "react-router-dom";
import { matchesSearch } from "@shared/format/search-terms.ts";
import { REFRIGERANT_CATALOGUE, type RefrigerantSummary } from "@shared/property-tables/refrigerant-catalogue.ts";
import { describeSafetyClass, safetyClasses } from "@shared/content/safety-classes.ts";
import { paths } from "@/config/paths.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { SafetyBadge } from "@/components/ui/safety-badge/safety-badge.tsx";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";

/**
 * The words the list finds a refrigerant by: its designation and name, and both again without
 * brackets, since "R1234ze(E)" is as often typed "1234zeE". The search rule itself is the app's one
 * (shared/format/search-terms.ts: "r32", "32" and "R-32" alike, every word somewhere).
 */
function searchTextOf(info: RefrigerantSummary): string {
  const text = `${info.id} ${info.name}`.toLowerCase();
  return `${text} ${text.replace(/[()]/g, "")}`;
}

export function RefrigerantList() {
  const [query, setQuery] = useState("");
  const deferredQuery = useDeferredValue(query);
  const searchId = useId();
  const refrigerants = REFRIGERANT_CATALOGUE;
  const shown = refrigerants.filter((info) => matchesSearch(searchTextOf(info), deferredQuery));

  return (
    <div className="space-y-4">
      <div>
        <label htmlFor={searchId} className="font-medium">
          Find a refrigerant
        </label>
        <SearchInput id={searchId} value={query} onChange={setQuery} placeholder="R32, 407C, propane…" large />
      </div>
      <p className="text-sm text-muted" aria-live="polite">
        {shown.length} of {refrigerants.length} refrigerants
      </p>
      {shown.length === 0 ? (
        <p className="rounded-card border-2 border-dashed border-rule p-6 text-center">
          No refrigerant matches “{deferredQuery}”. Try the number only, e.g. 410.
        </p>
      ) : (
        <ul className="grid gap-2 sm:grid-cols-2">
          {shown.map((info) => {
            const caution = safetyClasses[info.safety.class].caution;
            return (
              <li key={info.id}>
                <Link
                  to={paths.tables.detail.getHref(info.id)}
                  className="flex min-h-touch flex-col gap-1 rounded-card border-2 border-rule bg-surface p-3 hover:border-ink"
                >
                  <span className="flex items-center justify-between gap-2">
                    <span className="num text-xl font-semibold">{info.id}</span>
                    <SafetyBadge safetyClass={info.safety.class} />
                  </span>
                  <span className="text-sm text-muted">{info.name}</span>
                  <span className="text-sm">
                    {info.kind === "blend" ? "Blend" : "Single component"}
                    {info.glideAt0C && <span className="num"> · glide {formatNumber(info.glideAt0C.glideK, 1)} K</span>}
                    {info.gwp100.AR4 && <span className="num"> · GWP {info.gwp100.AR4.display} (AR4)</span>}
                  </span>
                  {caution && (
                    <span className="text-sm font-medium text-caution">⚠ {describeSafetyClass(info.safety.class)}</span>
                  )}
                </Link>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
