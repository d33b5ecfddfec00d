import { useDeferredValue, useId, useState } from "react";
import { Link } from "react-router-dom";
import { REFRIGERANT_CATALOGUE } from "@shared/property-tables/refrigerant-catalogue.ts";
import { describeSafetyClass, safetyClasses } from "@shared/content/safety-classes.ts";
import { paths } from "@/config/paths.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { SafetyBadge } from "@/components/ui/safety-badge/safety-badge.tsx";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";

/** Matches "r32", "32", "R-32", "1234ze" against designations and names. */
function normalise(text: string): string {
  return text
    .toLowerCase()
    .replace(/[\s\-–()]/g, "")
    .replace(/^r(?=\d)/, "");
}

export function RefrigerantList() {
  const [query, setQuery] = useState("");
  const deferredQuery = useDeferredValue(query);
  const searchId = useId();
  const refrigerants = REFRIGERANT_CATALOGUE;
  const needle = normalise(deferredQuery);
  const shown = refrigerants.filter(
    (info) => needle === "" || normalise(info.id).includes(needle) || normalise(info.name).includes(needle),
  );

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
