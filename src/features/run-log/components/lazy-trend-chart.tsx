import { lazy, Suspense, type ComponentProps } from "react";

// The chart and its charting package load only when a chart is shown (a chunk of their own).
const Chart = lazy(() => import("./trend-chart.tsx"));

/** The trend chart, fetched on first show; the space it takes is held while it loads. */
export function TrendChart(props: ComponentProps<typeof Chart>) {
  return (
    <Suspense
      fallback={
        <p aria-busy="true" className="text-muted" style={{ minHeight: props.height ?? 320 }}>
          Drawing the chart…
        </p>
      }
    >
      <Chart {...props} />
    </Suspense>
  );
}
