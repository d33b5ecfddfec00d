import { lazy, Suspense, useEffect, useSyncExternalStore } from "react";

/**
 * Error toasts, with the toast library (sonner) loaded on the first one: most sessions never
 * show a toast, and the library was 9 kB of every first page, the sign-in screen's included.
 * Messages raised before it has loaded wait in `queued` and are shown once its Toaster is
 * mounted (a Toaster shows only toasts raised after it subscribed).
 */
type Sonner = typeof import("sonner");

let sonner: Sonner | null = null;
let wanted = false;
const queued: string[] = [];
const listeners = new Set<() => void>();

/** Shows an error toast; the first call loads the toast library. */
export function toastError(message: string): void {
  if (sonner) {
    sonner.toast.error(message);
    return;
  }
  queued.push(message);
  if (!wanted) {
    wanted = true;
    for (const listener of listeners) listener();
  }
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

const SonnerToaster = lazy(async () => {
  const library = await import("sonner");
  function LoadedToaster() {
    // Runs after sonner's own Toaster has subscribed (a child's effects run first).
    useEffect(() => {
      sonner = library;
      for (const message of queued.splice(0)) library.toast.error(message);
    }, []);
    return <library.Toaster position="top-center" richColors closeButton toastOptions={{ style: { fontSize: "1rem" } }} />;
  }
  return { default: LoadedToaster };
});

/** Where toasts appear; renders nothing until the first toast is asked for. */
export function Toaster() {
  const shown = useSyncExternalStore(subscribe, () => wanted);
  if (!shown) return null;
  return (
    <Suspense fallback={null}>
      <SonnerToaster />
    </Suspense>
  );
}
