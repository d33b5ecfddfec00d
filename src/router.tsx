import type { QueryClient } from "@tanstack/react-query";
import type { ComponentType } from "react";
import { createBrowserRouter, type LoaderFunction, type LoaderFunctionArgs } from "react-router-dom";
import { AuthLayout } from "@/components/layouts/auth-layout.tsx";
import { RouteError } from "@/components/errors/route-error.tsx";
import { paths } from "@/config/paths.ts";
import { requireSessionLoader } from "@/features/auth/utils/session-loaders.ts";
import { keptDataRestored } from "@/features/offline/persist-queries.ts";

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

/**
 * A screen whose data the router starts itself: React Router runs a route's own loader beside
 * its lazy chunk, so the requests (and the refrigerant table) go out while the screen's script
 * downloads instead of after it. The loaders live in one small module of their own.
 */
/** The case editor starts a new case on R410A (case-editor.tsx). */
const NEW_CASE_REFRIGERANT = "R410A";

type ScreenData = typeof import("@/lib/api/screen-data.ts");
const screenData = () => import("@/lib/api/screen-data.ts");

function screen(
  queryClient: QueryClient,
  load: () => Promise<RouteModule>,
  prefetch: (data: ScreenData, queryClient: QueryClient, params: LoaderFunctionArgs["params"]) => Promise<unknown>,
) {
  return {
    // Offline, the screen's data is what the device kept: put back before the loader looks.
    loader: async ({ params }: LoaderFunctionArgs) => {
      const [data] = await Promise.all([screenData(), keptDataRestored()]);
      return prefetch(data, queryClient, params);
    },
    // The object form tells the router that the chunk brings only the component, so it runs the
    // loader at once instead of after the chunk.
    lazy: { Component: async () => (await load()).default },
  };
}

export function createRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      // Public account screens: no session needed, no app navigation.
      element: <AuthLayout />,
      errorElement: <RouteError />,
      children: [
        { path: paths.signIn.path, lazy: lazyRoute(queryClient, () => import("./routes/auth/sign-in.tsx")) },
        { path: paths.signUp.path, lazy: lazyRoute(queryClient, () => import("./routes/auth/sign-up.tsx")) },
        {
          path: paths.forgotPassword.path,
          lazy: lazyRoute(queryClient, () => import("./routes/auth/forgot-password.tsx")),
        },
        {
          path: paths.resetPassword.path,
          lazy: lazyRoute(queryClient, () => import("./routes/auth/reset-password.tsx")),
        },
        {
          path: paths.acceptInvitation.path,
          lazy: lazyRoute(queryClient, () => import("./routes/auth/accept-invitation.tsx")),
        },
      ],
    },
    {
      // Everything else needs a session: without one, sign in first and come back (requireSessionLoader).
      id: "signed-in",
      loader: requireSessionLoader(queryClient),
      // Shown for the moment the session check takes on first load.
      hydrateFallbackElement: <p className="p-6 text-muted">Loading Satura…</p>,
      // The app's frame (navigation, user menu) loads beside the screen's own chunk and its data,
      // so the public screens never download it.
      lazy: { Component: async () => (await import("@/components/layouts/app-shell.tsx")).AppShell },
      errorElement: <RouteError />,
      children: [
        {
          errorElement: <RouteError />,
          // One line per screen.
          children: [
            { path: paths.home.path, lazy: lazyRoute(queryClient, () => import("./routes/home.tsx")) },
            { path: paths.tables.path, lazy: lazyRoute(queryClient, () => import("./routes/pt-tables.tsx")) },
            {
              path: paths.tables.detail.path,
              ...screen(
                queryClient,
                () => import("./routes/pt-table.tsx"),
                (data, client, params) => data.prefetchRefrigerantScreen(client, params.refrigerantId ?? ""),
              ),
            },
            { path: paths.safety.path, lazy: lazyRoute(queryClient, () => import("./routes/safety.tsx")) },
            { path: paths.jobs.path, lazy: lazyRoute(queryClient, () => import("./routes/jobs.tsx")) },
            { path: paths.equipment.path, lazy: lazyRoute(queryClient, () => import("./routes/equipment-list.tsx")) },
            {
              path: paths.equipment.new.path,
              lazy: lazyRoute(queryClient, () => import("./routes/equipment-new.tsx")),
            },
            {
              path: paths.equipment.detail.path,
              ...screen(
                queryClient,
                () => import("./routes/equipment-detail.tsx"),
                (data, client, params) => data.prefetchEquipmentScreen(client, params.equipmentId ?? ""),
              ),
            },
            {
              path: paths.visits.detail.path,
              ...screen(
                queryClient,
                () => import("./routes/visit.tsx"),
                (data, client, params) => data.prefetchVisitScreen(client, params.visitId ?? ""),
              ),
            },
            {
              path: paths.visits.report.path,
              ...screen(
                queryClient,
                () => import("./routes/visit-report.tsx"),
                (data, client, params) => data.prefetchVisitScreen(client, params.visitId ?? ""),
              ),
            },
            { path: paths.casebook.path, lazy: lazyRoute(queryClient, () => import("./routes/casebook.tsx")) },
            {
              path: paths.casebook.new.path,
              ...screen(
                queryClient,
                () => import("./routes/casebook-editor.tsx"),
                (data, client) => data.prefetchCaseScreen(client, undefined, NEW_CASE_REFRIGERANT),
              ),
            },
            {
              path: paths.casebook.team.path,
              lazy: lazyRoute(queryClient, () => import("./routes/casebook-team.tsx")),
            },
            {
              path: paths.casebook.case.path,
              ...screen(
                queryClient,
                () => import("./routes/casebook-case.tsx"),
                (data, client, params) => data.prefetchCaseScreen(client, params.caseId, NEW_CASE_REFRIGERANT),
              ),
            },
            {
              path: paths.casebook.edit.path,
              ...screen(
                queryClient,
                () => import("./routes/casebook-editor.tsx"),
                (data, client, params) => data.prefetchCaseScreen(client, params.caseId, NEW_CASE_REFRIGERANT),
              ),
            },
            { path: paths.cylinders.path, lazy: lazyRoute(queryClient, () => import("./routes/cylinders.tsx")) },
            { path: paths.register.path, lazy: lazyRoute(queryClient, () => import("./routes/register.tsx")) },
            {
              path: paths.companySettings.path,
              lazy: lazyRoute(queryClient, () => import("./routes/company-settings.tsx")),
            },
            { path: paths.members.path, lazy: lazyRoute(queryClient, () => import("./routes/members.tsx")) },
            { path: paths.profile.path, lazy: lazyRoute(queryClient, () => import("./routes/profile.tsx")) },
            { path: paths.outbox.path, lazy: lazyRoute(queryClient, () => import("./routes/outbox.tsx")) },
            { path: "*", lazy: lazyRoute(queryClient, () => import("./routes/not-found.tsx")) },
          ],
        },
      ],
    },
  ]);
}
