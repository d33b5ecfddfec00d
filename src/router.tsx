import type { QueryClient } from "@tanstack/react-query";
import { createBrowserRouter, type LoaderFunctionArgs, type ShouldRevalidateFunctionArgs } from "react-router-dom";
import { AuthLayout } from "@/components/layouts/auth-layout.tsx";
import { RouteError } from "@/components/errors/route-error.tsx";
import { requireSessionLoader } from "@/features/auth/utils/session-loaders.ts";
import { keptDataRestored } from "@/features/offline/persist-queries.ts";
import { meQueryOptions } from "@/lib/api/auth.ts";
import { ACCOUNT_SCREENS, loadAppShell, SIGNED_IN_SCREENS, type ScreenModule } from "@/routes/screens.ts";

/**
 * Each screen is its own chunk, loaded when first visited, with its loader. Offline, the screen's
 * data is what the device kept: put back before any loader looks. A change of the search alone
 * (a section, a filter, a page) does not run the loader again: the screen's first render had its
 * data, and a list fetches its next page or filter itself, keeping the last one on screen.
 */
function lazyRoute(queryClient: QueryClient, load: () => Promise<ScreenModule>, { signedIn = false } = {}) {
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
  return createBrowserRouter([
    {
      element: <AuthLayout />,
      errorElement: <RouteError />,
      children: ACCOUNT_SCREENS.map(({ path, load }) => ({ path, lazy: lazyRoute(queryClient, load) })),
    },
    {
      // Everything else needs a session: without one, sign in first and come back (requireSessionLoader).
      id: "signed-in",
      loader: requireSessionLoader(queryClient),
      // Shown for the moment the session check takes on first load.
      hydrateFallbackElement: <p className="p-6 text-muted">Loading Satura…</p>,
      // The app's frame loads beside the screen's own chunk and its data.
      lazy: { Component: loadAppShell },
      errorElement: <RouteError />,
      children: [
        {
          errorElement: <RouteError />,
          children: SIGNED_IN_SCREENS.map(({ path, load }) => ({
            path,
            lazy: lazyRoute(queryClient, load, { signedIn: true }),
          })),
        },
      ],
    },
  ]);
}
