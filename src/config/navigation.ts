import {
  Gauge,
  ClipboardCheck,
  ClipboardList,
  Cylinder,
  GraduationCap,
  HardHat,
  Home,
  Mail,
  SlidersHorizontal,
  Table2,
  Users,
  Wrench,
  type LucideIcon,
} from "lucide-react";
import { PERMISSIONS, type Role } from "@shared/schemas/auth.ts";
import { paths } from "./paths.ts";

export interface NavItem {
  label: string;
  href: string;
  icon: LucideIcon;
  /** Marks the item active for nested URLs too (e.g. /tables/R32 under /tables). */
  matchPrefix?: boolean;
  /** Shown only to these roles (the server refuses the others anyway); everyone when absent. */
  roles?: readonly Role[];
  /** Shown only when the server offers the feature (the Outbox exists in development only). */
  requires?: "outbox";
  /** On the phone's bottom bar; the rest sit behind "More", so each target stays thumb-sized. */
  phoneBar?: boolean;
}

/** The app's sections, in the order a technician reaches for them. */
export const navigation: NavItem[] = [
  { label: "Today", href: paths.home.getHref(), icon: Home, phoneBar: true },
  { label: "Jobs", href: paths.jobs.getHref(), icon: ClipboardList, phoneBar: true },
  // The review queue: the jobs list narrowed to visits waiting for a senior's sign-off.
  { label: "Review", href: paths.jobs.getHref("awaiting-review"), icon: ClipboardCheck, roles: PERMISSIONS.signOff },
  { label: "Equipment", href: paths.equipment.getHref(), icon: Wrench, matchPrefix: true, phoneBar: true },
  { label: "P–T tables", href: paths.tables.getHref(), icon: Table2, matchPrefix: true, phoneBar: true },
  { label: "Cylinders", href: paths.cylinders.getHref(), icon: Cylinder, matchPrefix: true },
  { label: "Casebook", href: paths.casebook.getHref(), icon: GraduationCap, matchPrefix: true },
  { label: "Safety", href: paths.safety.getHref(), icon: HardHat },
  { label: "Members", href: paths.members.getHref(), icon: Users },
  { label: "Company limits", href: paths.companySettings.getHref(), icon: Gauge, roles: PERMISSIONS.manageMembers },
  { label: "Profile", href: paths.profile.getHref(), icon: SlidersHorizontal },
  { label: "Outbox", href: paths.outbox.getHref(), icon: Mail, roles: ["owner"], requires: "outbox" },
];

/**
 * Whether an item is the current section. Items may share a path and differ by query (Jobs
 * and the Review queue, /jobs?status=awaiting-review): the one whose query matches wins.
 */
export function isNavItemActive(
  item: NavItem,
  location: { pathname: string; search: string },
  items: readonly NavItem[],
): boolean {
  const matches = (candidate: NavItem) => {
    const url = new URL(candidate.href, "http://satura.invalid");
    const onPath = candidate.matchPrefix
      ? location.pathname === url.pathname || location.pathname.startsWith(`${url.pathname}/`)
      : location.pathname === url.pathname;
    if (!onPath) return false;
    const current = new URLSearchParams(location.search);
    return [...url.searchParams].every(([key, value]) => current.get(key) === value);
  };
  if (!matches(item)) return false;
  const queryless = !item.href.includes("?");
  // A plain item gives way to a sibling on the same path whose query matches more closely.
  return !(queryless && items.some((other) => other !== item && other.href.includes("?") && matches(other)));
}

/** The items one user sees. */
export function navigationFor(role: Role, features: { outbox: boolean }): NavItem[] {
  return navigation.filter(
    (item) => (!item.roles || item.roles.includes(role)) && (item.requires !== "outbox" || features.outbox),
  );
}
