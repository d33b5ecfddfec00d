import type { QueryClient } from "@tanstack/react-query";
import type { ComponentType } from "react";
// From react-router itself, not react-router-dom: this module runs before React DOM's (see
// startScreenImport), and react-router-dom's index takes React DOM in with it.
import { matchRoutes, type LoaderFunction } from "react-router";
import { paths } from "@/config/paths.ts";

export interface ScreenModule {
  default: ComponentType;
  /**
   * A screen that needs data before render exports a loader factory taking the QueryClient; the
   * loader calls `ensureQueryData` with the options the screen reads through `useSuspenseQuery`
   * (decision 040).
   */
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

export interface Screen {
  path: string;
  load: () => Promise<ScreenModule>;
}

/** Public account screens: no session needed, no app navigation. */
export const ACCOUNT_SCREENS: Screen[] = [
  { path: paths.signIn.path, load: () => import("./auth/sign-in.tsx") },
  { path: paths.signUp.path, load: () => import("./auth/sign-up.tsx") },
  { path: paths.forgotPassword.path, load: () => import("./auth/forgot-password.tsx") },
  { path: paths.resetPassword.path, load: () => import("./auth/reset-password.tsx") },
  { path: paths.acceptInvitation.path, load: () => import("./auth/accept-invitation.tsx") },
];

/** Everything else needs a session, inside the app's frame (`loadAppShell`). One line per screen. */
export const SIGNED_IN_SCREENS: Screen[] = [
  { path: paths.home.path, load: () => import("./home.tsx") },
  { path: paths.tables.path, load: () => import("./pt-tables.tsx") },
  { path: paths.tables.detail.path, load: () => import("./pt-table.tsx") },
  { path: paths.safety.path, load: () => import("./safety.tsx") },
  { path: paths.jobs.path, load: () => import("./jobs.tsx") },
  { path: paths.equipment.path, load: () => import("./equipment-list.tsx") },
  { path: paths.equipment.new.path, load: () => import("./equipment-new.tsx") },
  { path: paths.equipment.detail.path, load: () => import("./equipment-detail.tsx") },
  { path: paths.visits.detail.path, load: () => import("./visit.tsx") },
  { path: paths.visits.report.path, load: () => import("./visit-report.tsx") },
  { path: paths.casebook.path, load: () => import("./casebook.tsx") },
  { path: paths.casebook.new.path, load: () => import("./casebook-editor.tsx") },
  { path: paths.casebook.team.path, load: () => import("./casebook-team.tsx") },
  { path: paths.casebook.case.path, load: () => import("./casebook-case.tsx") },
  { path: paths.casebook.edit.path, load: () => import("./casebook-editor.tsx") },
  { path: paths.cylinders.path, load: () => import("./cylinders.tsx") },
  { path: paths.register.path, load: () => import("./register.tsx") },
  { path: paths.companySettings.path, load: () => import("./company-settings.tsx") },
  { path: paths.members.path, load: () => import("./members.tsx") },
  { path: paths.profile.path, load: () => import("./profile.tsx") },
  { path: paths.outbox.path, load: () => import("./outbox.tsx") },
  { path: "*", load: () => import("./not-found.tsx") },
];

/** The signed-in screens' frame (navigation, user menu): the public screens never download it. */
export const loadAppShell = async () => (await import("@/components/layouts/app-shell.tsx")).AppShell;

/** The screen the router will show at `pathname`, and whether it sits in the signed-in frame. */
export function screenAt(pathname: string): { screen: Screen; signedIn: boolean } | undefined {
  // The signed-in list ends with "*", which matches a public screen's path too: its own list decides.
  const account = matchRoutes(ACCOUNT_SCREENS, pathname)?.[0]?.route;
  if (account) return { screen: account, signedIn: false };
  const signedIn = matchRoutes(SIGNED_IN_SCREENS, pathname)?.[0]?.route;
  return signedIn && { screen: signedIn, signedIn: true };
}

/**
 * Asks for the scripts of the screen at `pathname` (and the frame around it) at once. Called
 * from the entry chunk's first module, before React DOM's module and the router have run: on the
 * throttled phone those took 0.25–0.35 s after the entry chunk arrived, while the link stood idle
 * and the screen's scripts waited to be asked for. The router's lazy routes call the same `load`,
 * so the browser fetches and runs each module once; a failed load is reported by the router's.
 */
export function startScreenImport(pathname: string): void {
  const found = screenAt(pathname);
  if (!found) return;
  found.screen.load().catch(() => undefined);
  if (found.signedIn) loadAppShell().catch(() => undefined);
}
