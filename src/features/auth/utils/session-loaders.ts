import type { QueryClient } from "@tanstack/react-query";
import { redirect, type LoaderFunctionArgs } from "react-router-dom";
import { paths } from "@/config/paths.ts";
import { keptDataRestored } from "@/features/offline/persist-queries.ts";
import { meQueryOptions } from "@/lib/api/auth.ts";

/**
 * Loader of the signed-in part of the app: without a session, go to sign-in and come back
 * here afterwards. The user is cached, so this asks the server once, not per screen.
 */
export function requireSessionLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    // Offline, who is signed in comes from the data kept on the device (or nowhere).
    await keptDataRestored();
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (!user) {
      const url = new URL(request.url);
      throw redirect(paths.signIn.getHref(`${url.pathname}${url.search}`));
    }
    return null;
  };
}

/** Loader of sign-in and sign-up: someone already signed in goes straight to the app. */
export function redirectIfSignedInLoader(queryClient: QueryClient) {
  return async () => {
    await keptDataRestored();
    const user = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    if (user) throw redirect(paths.home.getHref());
    return null;
  };
}
