import { lazy, Suspense, type ComponentType, type LazyExoticComponent } from "react";
import { useFirstScreenSettled } from "@/lib/first-screen.ts";

interface LazyPanelOptions {
  /**
   * Wait until the first screen has been drawn with its data (src/lib/first-screen.ts) before
   * fetching the panel's code: for a panel below the first screenful of a screen opened first,
   * whose code would otherwise share the phone's link with what the technician is waiting for.
   */
  afterFirstScreen?: boolean;
}

/**
 * A panel whose code loads the first time it is shown, in a chunk of its own: a screen's sections
 * that start hidden (a visit's procedures, its refrigerant) cost nothing on its first load. The
 * panel keeps its name and props; a short line holds its place while it loads. The line has no
 * field, so nothing can be typed into a panel before it is there; once shown, the panel never
 * goes back to the line (its code is held), so what is typed in it stays.
 *
 * A load that failed (no signal, and the app's files not yet kept on the device) is forgotten:
 * the panel's boundary offers "Try again", which fetches the code again.
 *
 * @example const ElectricalPanel = lazyPanel(() => import("./electrical-panel.tsx"), "ElectricalPanel");
 */
export function lazyPanel<Props extends object, Name extends string>(
  load: () => Promise<Record<Name, ComponentType<Props>>>,
  name: Name,
  options: LazyPanelOptions = {},
): ComponentType<Props> {
  const fresh = (): LazyExoticComponent<ComponentType<Props>> =>
    lazy(async () => {
      try {
        return { default: (await load())[name] };
      } catch (error) {
        Panel = fresh();
        throw error;
      }
    });
  let Panel = fresh();
  const placeholder = (
    <p aria-busy="true" className="text-muted">
      Loading…
    </p>
  );
  function LazyPanel(props: Props) {
    const firstScreenSettled = useFirstScreenSettled();
    if (options.afterFirstScreen && !firstScreenSettled) return placeholder;
    return (
      <Suspense fallback={placeholder}>
        <Panel {...props} />
      </Suspense>
    );
  }
  LazyPanel.displayName = `Lazy(${name})`;
  return LazyPanel;
}
