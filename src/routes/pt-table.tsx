import { Printer } from "lucide-react";
import { useState } from "react";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useParams, type LoaderFunctionArgs } from "react-router-dom";
import { getRefrigerant } from "@shared/engine/index.ts";
import { isKnownRefrigerant } from "@shared/property-tables/refrigerant-catalogue.ts";
import { safetyClasses } from "@shared/content/safety-classes.ts";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { RefrigerantFacts } from "@/features/pt-tables/components/refrigerant-facts.tsx";
import { SafetyBadge } from "@/components/ui/safety-badge/safety-badge.tsx";
import { SaturationConverter } from "@/features/pt-tables/components/saturation-converter.tsx";
import { SaturationTable } from "@/features/pt-tables/components/saturation-table.tsx";
import { TableControls, type TableRange } from "@/features/pt-tables/components/table-controls.tsx";
import { UnitsBar } from "@/features/pt-tables/components/units-bar.tsx";
import { resolveRange } from "@/features/pt-tables/utils/resolve-range.ts";
import { formatNumber, temperatureToDisplay, type DisplayUnits } from "@/lib/units/display-units.ts";
import { ensureRefrigerantTable, refrigerantTableQueryOptions } from "@/lib/api/refrigerant-tables.ts";
import { useDisplayUnits } from "@/lib/units/use-display-units.ts";

function defaultRange(minimumC: number, maximumC: number, units: DisplayUnits): TableRange {
  // The service range most technicians read: -40 … +60 °C, inside the table.
  const from = Math.max(Math.ceil(minimumC), -40);
  const to = Math.min(Math.floor(maximumC), 60);
  return {
    fromText: formatNumber(temperatureToDisplay(from, units.temperature), 0),
    toText: formatNumber(temperatureToDisplay(to, units.temperature), 0),
    stepK: 1,
    scale: "gauge",
  };
}

/** The refrigerant's table before the screen renders (an unknown name loads nothing). */
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    ensureRefrigerantTable(queryClient, params.refrigerantId ?? "");

export default function PtTableRoute() {
  const { refrigerantId = "" } = useParams();
  if (!isKnownRefrigerant(refrigerantId)) {
    return (
      <div className="space-y-3">
        <h1 className="text-2xl font-semibold">Unknown refrigerant</h1>
        <p>
          Satura has no table for “<span className="num">{refrigerantId}</span>”.
        </p>
        <Link to={paths.tables.getHref()} className="font-medium text-accent underline underline-offset-4">
          All P–T tables
        </Link>
      </div>
    );
  }
  return (
    <ScreenBoundary
      key={refrigerantId}
      pending={<p aria-busy="true">Loading the {refrigerantId} table…</p>}
      failed={(error, retry) => (
        <div role="alert" className="space-y-2">
          <p className="font-medium text-fault">
            ⚠ The {refrigerantId} table did not load: {error.message}
          </p>
          <Button variant="secondary" onClick={retry}>
            Try again
          </Button>
        </div>
      )}
    >
      <PtTable refrigerantId={refrigerantId} />
    </ScreenBoundary>
  );
}

function PtTable({ refrigerantId }: { refrigerantId: string }) {
  // The engine looks the table up synchronously once it is loaded (decision 022).
  useSuspenseQuery(refrigerantTableQueryOptions(refrigerantId));
  const info = getRefrigerant(refrigerantId);
  const profile = useDisplayUnits();
  // Starts in the user's display units; switching here changes this page only.
  const [chosenUnits, setUnits] = useState<DisplayUnits | null>(null);
  const units = chosenUnits ?? profile.units;
  const [range, setRange] = useState<TableRange | null>(null);

  const limits = info.validRange;
  const currentRange = range ?? defaultRange(limits.minimumC, limits.maximumC, units);
  const resolved = resolveRange(
    currentRange.fromText,
    currentRange.toText,
    currentRange.stepK,
    units.temperature,
    limits,
  );
  const caution = safetyClasses[info.safety.class].caution;
  const atmosphericKPa = profile.atmosphericKPa;

  return (
    <div className="space-y-5">
      <nav aria-label="Breadcrumb" className="no-print text-sm">
        <Link to={paths.tables.getHref()} className="text-accent underline underline-offset-4">
          P–T tables
        </Link>{" "}
        / <span className="num">{info.id}</span>
      </nav>
      <header className="flex flex-wrap items-center gap-3">
        <h1 className="num text-3xl font-semibold">{info.id}</h1>
        <SafetyBadge safetyClass={info.safety.class} />
        <span className="text-muted">{info.name}</span>
      </header>
      {caution && (
        <div className="no-print">
          <CautionPanel topic={caution} compact />
        </div>
      )}
      <div className="no-print">
        <UnitsBar
          units={units}
          onChange={(next) => {
            setUnits(next);
            // The typed range is in the old unit: restart it in the new one.
            if (next.temperature !== units.temperature) setRange(null);
          }}
        />
      </div>
      <div className="no-print">
        <SaturationConverter
          refrigerantId={info.id}
          isBlend={info.kind === "blend"}
          units={units}
          atmosphericKPa={atmosphericKPa}
        />
      </div>
      <section aria-labelledby="table-heading" className="space-y-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="table-heading" className="text-lg font-semibold">
            Saturation table
          </h2>
          <Button variant="secondary" className="no-print" onClick={() => window.print()}>
            <Printer aria-hidden className="size-5" /> Print
          </Button>
        </div>
        <p className="text-sm text-muted">
          Gauge pressures against an atmosphere of <span className="num">{atmosphericKPa} kPa</span>.
        </p>
        <TableControls
          range={currentRange}
          onChange={setRange}
          temperatureUnit={units.temperature}
          error={resolved.ok ? null : resolved.message}
        />
        {/* Focusable so keyboard users can scroll a long table (WCAG 2.1.1). */}
        <div
          tabIndex={0}
          role="region"
          aria-label={`${info.id} saturation table`}
          className="max-h-[70vh] overflow-auto rounded-card border-2 border-rule bg-surface print:max-h-none print:overflow-visible"
        >
          {resolved.ok && (
            <SaturationTable
              refrigerantId={info.id}
              isBlend={info.kind === "blend"}
              fromC={resolved.fromC}
              toC={resolved.toC}
              stepK={currentRange.stepK}
              units={units}
              scale={currentRange.scale}
              atmosphericKPa={atmosphericKPa}
            />
          )}
        </div>
      </section>
      <section aria-labelledby="facts-heading" className="rounded-card border-2 border-rule bg-surface p-4">
        <h2 id="facts-heading" className="mb-2 text-lg font-semibold">
          About {info.id}
        </h2>
        <RefrigerantFacts info={info} temperatureUnit={units.temperature} />
      </section>
    </div>
  );
}
