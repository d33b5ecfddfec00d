import { RefrigerantList } from "@/features/pt-tables/components/refrigerant-list.tsx";

export default function PtTablesRoute() {
  return (
    <div className="space-y-4">
      <header>
        <h1 className="text-2xl font-semibold">P–T tables</h1>
        <p className="mt-1 max-w-prose text-muted">
          Saturation pressure and temperature for every refrigerant Satura knows, computed from published equations of
          state. Blends show bubble and dew points.
        </p>
      </header>
      <RefrigerantList />
    </div>
  );
}
