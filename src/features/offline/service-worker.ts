import { offerUpdate } from "./app-update.ts";
import { whenIdle } from "./when-idle.ts";

/** How often an open app asks the server whether a new version was deployed. */
const UPDATE_CHECK_MS = 60 * 60 * 1000;

/**
 * Registers the service worker that keeps the app's shell on the device (vite.config.ts,
 * `installableApp`), once the first screen is drawn and the browser is idle: the worker's
 * first install fetches the whole shell, which must not compete with the screen's own
 * requests. Production builds only; the development server has no worker.
 *
 * A new version is never forced on a technician mid-visit: it waits until they choose to
 * reload from the banner (the typed values are kept on the device by the drafts).
 */
export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || !("serviceWorker" in navigator)) return;
  const register = () => {
    void import("virtual:pwa-register").then(({ registerSW }) => {
      const updateServiceWorker = registerSW({
        onNeedRefresh: () => offerUpdate({ apply: () => updateServiceWorker(true) }),
        onRegisteredSW: (_url, registration) => {
          if (!registration) return;
          setInterval(() => {
            if (navigator.onLine) void registration.update().catch(() => undefined);
          }, UPDATE_CHECK_MS);
        },
      });
    });
  };
  // After the page's load event: while a lazily loaded screen is still on its way, the browser
  // is idle between requests, and the worker would otherwise start before the screen is drawn.
  const afterLoad = () => whenIdle(register, 5000);
  if (document.readyState === "complete") afterLoad();
  else window.addEventListener("load", afterLoad, { once: true });
}
