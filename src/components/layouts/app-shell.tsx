import { Menu } from "lucide-react";
import { useEffect, useState } from "react";
import { Link, Navigate, Outlet, useLocation, useNavigation } from "react-router-dom";
import { fetchToastLibraryWhenIdle } from "@/components/ui/toaster/toaster.tsx";
import { SaturaMark } from "@/components/ui/satura-mark/satura-mark.tsx";
import { isNavItemActive, navigationFor, type NavItem } from "@/config/navigation.ts";
import { paths } from "@/config/paths.ts";
import { UserMenu } from "@/features/auth/components/user-menu.tsx";
import { useDayOnDevice } from "@/features/offline/use-day-on-device.ts";
import { wantConnectionBanners } from "@/features/offline/deferred-connection-banners.tsx";
import { registerServiceWorker } from "@/features/offline/service-worker.ts";
import { useOfflineTables } from "@/features/offline/use-offline-tables.ts";
import { useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { useOutboxSender } from "@/features/offline/use-outbox-sender.ts";
import { SunlightToggle } from "@/features/theme/components/sunlight-toggle.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { useOutboxAvailable } from "@/lib/api/outbox.ts";
import { useHealth } from "@/lib/api/health.ts";
import { cn } from "@/lib/cn.ts";

function ServerStatus() {
  const health = useHealth();
  if (health.isPending) return <span className="text-muted">Connecting…</span>;
  if (health.isError)
    return <span className="font-medium text-fault">⚠ Server unreachable — entries are not being saved</span>;
  return (
    <span className="text-muted">
      ● Server connected <span className="num">v{health.data.version}</span>
    </span>
  );
}

/**
 * The frame of every signed-in screen: a side rail with labels on tablets and desktops,
 * a bottom bar within thumb reach on phones, and the Sunlight switch always one tap away.
 */
export function AppShell() {
  const navigationState = useNavigation();
  const location = useLocation();
  const me = useMe();
  const role = me.data?.role ?? "apprentice";
  const outbox = useOutboxAvailable(role === "owner");
  const navigation = navigationFor(role, { outbox: outbox.data === true });
  // Held before the first toast of a signed-in screen (toaster.tsx says why).
  useEffect(fetchToastLibraryWhenIdle, []);
  // The app's shell on the device for offline use, once this first screen is drawn (service-worker.ts).
  useEffect(registerServiceWorker, []);
  // Entries waiting on the device, counted in the banners above every screen, are this person's.
  useEffect(wantConnectionBanners, []);
  useOfflineTables();
  useDayOnDevice();
  useOutboxSender(useOutboxEntries());
  // The session ended while the app was open (expired, signed out elsewhere, member removed).
  if (me.isSuccess && me.data === null)
    return <Navigate to={paths.signIn.getHref(`${location.pathname}${location.search}`)} replace />;
  return (
    <div className="flex min-h-dvh flex-col md:flex-row">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-surface focus:p-3"
      >
        Skip to content
      </a>
      <aside className="no-print hidden w-56 shrink-0 flex-col border-r-2 border-rule bg-surface md:flex">
        <div className="flex items-center gap-2 px-4 py-5">
          <SaturaMark className="size-8" />
          <span className="text-xl font-semibold tracking-tight">Satura</span>
        </div>
        <nav aria-label="Main" className="flex flex-col gap-1 px-2">
          {navigation.map((item) => (
            <Link
              key={item.href}
              to={item.href}
              aria-current={isNavItemActive(item, location, navigation) ? "page" : undefined}
              className={cn(
                "flex min-h-touch items-center gap-3 rounded-card px-3 font-medium",
                isNavItemActive(item, location, navigation) ? "bg-ink text-paper" : "text-ink hover:bg-sunken",
              )}
            >
              <item.icon aria-hidden className="size-5" />
              {item.label}
            </Link>
          ))}
        </nav>
        <div className="mt-auto space-y-3 p-3">
          <UserMenu />
          <SunlightToggle className="w-full justify-center" />
        </div>
      </aside>

      <div className="flex min-w-0 flex-1 flex-col">
        <header className="no-print flex items-center justify-between gap-2 border-b-2 border-rule bg-surface px-4 py-2 md:hidden">
          <div className="flex items-center gap-2">
            <SaturaMark className="size-7" />
            <span className="text-lg font-semibold">Satura</span>
          </div>
          <div className="flex items-center gap-2">
            <SunlightToggle />
            <UserMenu compact />
          </div>
        </header>
        <div aria-live="polite" className="h-1">
          {navigationState.state === "loading" && (
            <div className="h-1 w-full animate-pulse bg-accent" role="progressbar" aria-label="Loading page" />
          )}
        </div>
        <main id="main" className="mx-auto w-full max-w-5xl flex-1 px-4 pb-28 pt-4 md:px-8 md:pb-10">
          <Outlet />
        </main>
        <footer className="no-print hidden px-8 pb-4 text-sm md:block">
          <ServerStatus />
        </footer>
      </div>

      <PhoneNavigation navigation={navigation} location={location} />
    </div>
  );
}

/**
 * The phone's bottom bar: the four sections used on the roof, then "More" for the rest, so
 * every target stays wide enough for a gloved thumb.
 */
function PhoneNavigation({
  navigation,
  location,
}: {
  navigation: NavItem[];
  location: { pathname: string; search: string };
}) {
  const [moreOpen, setMoreOpen] = useState(false);
  const onBar = navigation.filter((item) => item.phoneBar);
  const behindMore = navigation.filter((item) => !item.phoneBar);
  const moreActive = behindMore.some((item) => isNavItemActive(item, location, navigation));
  const itemClass = (active: boolean) =>
    cn(
      "flex min-h-16 flex-1 flex-col items-center justify-center gap-0.5 text-xs font-medium",
      active ? "bg-ink text-paper" : "text-ink",
    );
  return (
    <nav
      aria-label="Main"
      className="no-print fixed inset-x-0 bottom-0 z-40 border-t-2 border-rule bg-surface pb-[env(safe-area-inset-bottom)] md:hidden"
    >
      {moreOpen && (
        <ul id="more-sections" className="grid grid-cols-2 gap-1 border-b-2 border-rule p-2">
          {behindMore.map((item) => (
            <li key={item.href}>
              <Link
                to={item.href}
                onClick={() => setMoreOpen(false)}
                aria-current={isNavItemActive(item, location, navigation) ? "page" : undefined}
                className={cn(
                  "flex min-h-touch items-center gap-2 rounded-card px-3 font-medium",
                  isNavItemActive(item, location, navigation) ? "bg-ink text-paper" : "hover:bg-sunken",
                )}
              >
                <item.icon aria-hidden className="size-5" />
                {item.label}
              </Link>
            </li>
          ))}
        </ul>
      )}
      <div className="flex">
        {onBar.map((item) => (
          <Link
            key={item.href}
            to={item.href}
            onClick={() => setMoreOpen(false)}
            aria-current={isNavItemActive(item, location, navigation) ? "page" : undefined}
            className={itemClass(isNavItemActive(item, location, navigation))}
          >
            <item.icon aria-hidden className="size-6" />
            {item.label}
          </Link>
        ))}
        {behindMore.length > 0 && (
          <button
            type="button"
            aria-expanded={moreOpen}
            aria-controls="more-sections"
            onClick={() => setMoreOpen((open) => !open)}
            className={itemClass(moreActive || moreOpen)}
          >
            <Menu aria-hidden className="size-6" />
            More
          </button>
        )}
      </div>
    </nav>
  );
}
