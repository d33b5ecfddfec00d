import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { RouterProvider } from "react-router-dom";
import "./styles/app.css";
import { applyTheme, readTheme } from "./features/theme/theme-store.ts";
import { startFirstRequests } from "./lib/api/first-requests.ts";
import { registerServiceWorker } from "./features/offline/service-worker.ts";
import { createQueryClient } from "./lib/api/query-client.ts";
import { AppProviders } from "./providers.tsx";
import { createRouter } from "./router.tsx";

// Apply the stored theme before the first paint, so Sunlight mode never flashes paper.
applyTheme(readTheme());

const queryClient = createQueryClient();
// The screen's data goes out before the router asks for the screen's scripts.
startFirstRequests(queryClient, window.location.pathname);
const router = createRouter(queryClient);

createRoot(document.getElementById("root")!).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);

registerServiceWorker();
