import { lazy, Suspense, useSyncExternalStore } from "react";
import { afterFirstScreen } from "@/lib/first-screen.ts";
import { useWaitingUpdate } from "./app-update.ts";
import { useOnlineStatus } from "./online-status.ts";

const nothing = () => null;

/**
 * Never the page's error: without the banners' code (no signal, and the app's files not yet kept
 * on the device) the screen goes on without them, and the next change of signal, which draws
 * this again, fetches them anew.
 */
function loadBanners() {
  return lazy(async () => {
    try {
      return { default: (await import("./connection-banners.tsx")).ConnectionBanners };
    } catch {
      Banners = loadBanners();
      return { default: nothing };
    }
  });
}
let Banners = loadBanners();

let wanted = false;
const listeners = new Set<() => void>();

/**
 * Called by the signed-in frame: entries waiting on the device belong to the person signed in,
 * so the banners that count them are wanted there, once its first screen is drawn with its data.
 */
export function wantConnectionBanners(): void {
  afterFirstScreen(() => {
    if (wanted) return;
    wanted = true;
    for (const listener of listeners) listener();
  });
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/**
 * The connection banners (connection-banners.tsx), fetched only when one can have something to
 * say: at once when the device is offline or a new version waits (the service worker offers it),
 * and in the signed-in frame once its first screen is drawn (the outbox is first read then). Their
 * code, with the outbox's and the button's, is off every screen's first load, and a public screen
 * with signal never fetches it.
 */
export function DeferredConnectionBanners() {
  const online = useOnlineStatus();
  const update = useWaitingUpdate();
  const signedInFrame = useSyncExternalStore(subscribe, () => wanted);
  if (online && !update && !signedInFrame) return null;
  return (
    <Suspense fallback={null}>
      <Banners />
    </Suspense>
  );
}
