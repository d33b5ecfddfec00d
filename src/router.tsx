import type { QueryClient } from "@tanstack/react-query";
import type { ComponentType } from "react";
import {
  createBrowserRouter,
  type LoaderFunction,
  type LoaderFunctionArgs,
  type ShouldRevalidateFunctionArgs,
} from "react-router-dom";
import { AuthLayout } from "@/components/layouts/auth-layout.tsx";
import { RouteError } from "@/components/errors/route-error.tsx";
import { paths } from "@/config/paths.ts";
import { requireSessionLoader } from "@/features/auth/utils/session-loaders.ts";
import { keptDataRestored } from "@/features/offline/persist-queries.ts";
import { meQueryOptions } from "@/lib/api/auth.ts";

interface RouteModule {
  default: ComponentType;
  /**
   * A screen that needs data before render exports a loader factory taking the QueryClient; the
   * loader calls `ensureQueryData` with the options the screen reads through `useSuspenseQuery`
   * (decision 040).
   */
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

/**
 * Each screen is its own chunk, loaded when first visited, with its loader. Offline, the screen's
 * data is what the device kept: put back before any loader looks. A change of the search alone
 * (a section, a filter, a page) does not run the loader again: the screen's first render had its
 * data, and a list fetches its next page or filter itself, keeping the last one on screen.
 */
function lazyRoute(queryClient: QueryClient, load: () => Promise<RouteModule>, { signedIn = false } = {}) {
  return async () => {
    const module = await load();
    const loader = module.clientLoader?.(queryClient);
    return {
      Component: module.default,
      loader:
        loader &&
        (async (args: LoaderFunctionArgs) => {
          await keptDataRestored();
          // React Router runs the signed-in frame's session check beside this loader: without a
          // session that check sends the person to sign in, and the screen asks for nothing.
          if (signedIn && !(await queryClient.ensureQueryData(meQueryOptions()).catch(() => null))) return null;
          // The screens read the query cache, not the loader's value; the router wants one all the same.
          return (await loader(args)) ?? null;
        }),
      shouldRevalidate: ({ currentUrl, nextUrl, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) =>
        currentUrl.pathname !== nextUrl.pathname && defaultShouldRevalidate,
    };
  };
}

export function createRouter(queryClient: QueryClient) {
  const screen = (load: () => Promise<RouteModule>) => lazyRoute(queryClient, load, { signedIn: true });
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
            { path: paths.home.path, lazy: screen(() => import("./routes/home.tsx")) },
            { path: paths.tables.path, lazy: screen(() => import("./routes/pt-tables.tsx")) },
            { path: paths.tables.detail.path, lazy: screen(() => import("./routes/pt-table.tsx")) },
            { path: paths.safety.path, lazy: screen(() => import("./routes/safety.tsx")) },
            { path: paths.jobs.path, lazy: screen(() => import("./routes/jobs.tsx")) },
            { path: paths.equipment.path, lazy: screen(() => import("./routes/equipment-list.tsx")) },
            { path: paths.equipment.new.path, lazy: screen(() => import("./routes/equipment-new.tsx")) },
            { path: paths.equipment.detail.path, lazy: screen(() => import("./routes/equipment-detail.tsx")) },
            { path: paths.visits.detail.path, lazy: screen(() => import("./routes/visit.tsx")) },
            { path: paths.visits.report.path, lazy: screen(() => import("./routes/visit-report.tsx")) },
            { path: paths.casebook.path, lazy: screen(() => import("./routes/casebook.tsx")) },
            { path: paths.casebook.new.path, lazy: screen(() => import("./routes/casebook-editor.tsx")) },
            { path: paths.casebook.team.path, lazy: screen(() => import("./routes/casebook-team.tsx")) },
            { path: paths.casebook.case.path, lazy: screen(() => import("./routes/casebook-case.tsx")) },
            { path: paths.casebook.edit.path, lazy: screen(() => import("./routes/casebook-editor.tsx")) },
            { path: paths.cylinders.path, lazy: screen(() => import("./routes/cylinders.tsx")) },
            { path: paths.register.path, lazy: screen(() => import("./routes/register.tsx")) },
            { path: paths.companySettings.path, lazy: screen(() => import("./routes/company-settings.tsx")) },
            { path: paths.members.path, lazy: screen(() => import("./routes/members.tsx")) },
            { path: paths.profile.path, lazy: screen(() => import("./routes/profile.tsx")) },
            { path: paths.outbox.path, lazy: screen(() => import("./routes/outbox.tsx")) },
            { path: "*", lazy: screen(() => import("./routes/not-found.tsx")) },
          ],
        },
      ],
    },
  ]);
}
