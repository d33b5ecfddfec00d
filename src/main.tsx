// First: its body runs before the other modules of the entry chunk (start-first-screen.ts).
import "./start-first-screen.ts";
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { RouterProvider } from "react-router-dom";
import "./styles/app.css";
import { applyTheme, readTheme } from "./features/theme/theme-store.ts";
import { keepDataOnDevice, restoreKeptData } from "./features/offline/persist-queries.ts";
import { createQueryClient } from "./lib/api/query-client.ts";
import { watchFirstScreen } from "./lib/first-screen.ts";
import { warmDateFormat } from "./lib/warm-date-format.ts";
import { AppProviders } from "./providers.tsx";
import { createRouter } from "./router.tsx";

// Apply the stored theme before the first paint, so Sunlight mode never flashes paper.
applyTheme(readTheme());

const queryClient = createQueryClient();
// The data kept on the device comes back while the scripts download; the session loader waits
// for it, so a screen opened without signal finds its visit. Then each change is kept again.
void restoreKeptData(queryClient).then(() => keepDataOnDevice(queryClient));
const router = createRouter(queryClient);
// Work the first screen does not need (the service worker, the connection banners, panels below
// the first screenful) waits until it is drawn with its data.
watchFirstScreen(router, queryClient);

createRoot(document.getElementById("root")!).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);
// The first screen's scripts and data have been asked for: build Intl's date data while they come.
warmDateFormat();
