import type { QueryClient } from "@tanstack/react-query";
import type { ComponentType } from "react";
import { createBrowserRouter, type LoaderFunction } from "react-router-dom";
import { AppShell } from "@/components/layouts/app-shell.tsx";
import { RouteError } from "@/components/errors/route-error.tsx";
import { paths } from "@/config/paths.ts";

interface RouteModule {
  default: ComponentType;
  /** A route that needs data before render exports a loader factory taking the QueryClient. */
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

/** Each screen is its own chunk, loaded when first visited. */
function lazyRoute(queryClient: QueryClient, load: () => Promise<RouteModule>) {
  return async () => {
    const module = await load();
    return { Component: module.default, loader: module.clientLoader?.(queryClient) };
  };
}

export function createRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      element: <AppShell />,
      errorElement: <RouteError />,
      children: [
        {
          errorElement: <RouteError />,
          children: [
            { path: paths.home.path, lazy: lazyRoute(queryClient, () => import("./routes/home.tsx")) },
            { path: paths.tables.path, lazy: lazyRoute(queryClient, () => import("./routes/pt-tables.tsx")) },
            { path: paths.tables.detail.path, lazy: lazyRoute(queryClient, () => import("./routes/pt-table.tsx")) },
            { path: paths.safety.path, lazy: lazyRoute(queryClient, () => import("./routes/safety.tsx")) },
            { path: "*", lazy: lazyRoute(queryClient, () => import("./routes/not-found.tsx")) },
          ],
        },
      ],
    },
  ]);
}
