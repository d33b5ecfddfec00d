import { lazy, Suspense, type ComponentType } from "react";

/**
 * A panel whose code loads the first time it is shown, in a chunk of its own: a screen's sections
 * that start hidden (a visit's procedures, its refrigerant) cost nothing on its first load. The
 * panel keeps its name and props; a short line holds its place while it loads.
 *
 * @example const ElectricalPanel = lazyPanel(() => import("./electrical-panel.tsx"), "ElectricalPanel");
 */
export function lazyPanel<Props extends object, Name extends string>(
  load: () => Promise<Record<Name, ComponentType<Props>>>,
  name: Name,
): ComponentType<Props> {
  const Panel = lazy<ComponentType<Props>>(async () => ({ default: (await load())[name] }));
  function LazyPanel(props: Props) {
    return (
      <Suspense fallback={<p aria-busy="true" className="text-muted">Loading…</p>}>
        <Panel {...props} />
      </Suspense>
    );
  }
  LazyPanel.displayName = `Lazy(${name})`;
  return LazyPanel;
}
