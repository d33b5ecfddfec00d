import { offerUpdate } from "./app-update.ts";
import { whenIdleAfterFirstScreen } from "@/lib/first-screen.ts";

/** How often an open app asks the server whether a new version was deployed. */
const UPDATE_CHECK_MS = 60 * 60 * 1000;

/**
 * Registers the service worker that keeps the app's shell on the device (vite.config.ts,
 * `installableApp`). Called by the signed-in frame: nothing works offline without a session, and
 * a worker once registered keeps serving every screen, the sign-in page's included, so the public
 * screens leave its script and its first install (the whole shell, ≈ 1.8 MB) alone. It waits
 * until the first screen is drawn with its data (src/lib/first-screen.ts) and the browser is
 * idle: on a slow link the worker must not take the bandwidth of what the technician waits for.
 * Production builds only; the development server has no worker. Once per page; a failed fetch of
 * the registration's script (no signal) is tried again when the frame is next drawn.
 *
 * A new version is never forced on a technician mid-visit: it waits until they choose to
 * reload from the banner (the typed values are kept on the device by the drafts).
 */
let registered = false;

export function registerServiceWorker(): void {
  if (registered || !import.meta.env.PROD || !("serviceWorker" in navigator)) return;
  registered = true;
  const register = () => {
    void import("virtual:pwa-register").then(
      ({ registerSW }) => {
        const updateServiceWorker = registerSW({
          onNeedRefresh: () => offerUpdate({ apply: () => updateServiceWorker(true) }),
          onRegisteredSW: (_url, registration) => {
            if (!registration) return;
            setInterval(() => {
              if (navigator.onLine) void registration.update().catch(() => undefined);
            }, UPDATE_CHECK_MS);
          },
        });
      },
      () => {
        registered = false;
      },
    );
  };
  // Not at the page's load event: the screen's own chunks, its data and the run log's
  // refrigerant tables are still on their way then, and the worker's script took their bandwidth.
  whenIdleAfterFirstScreen(register, 5000);
}
