import { HardHat, Home, Table2, type LucideIcon } from "lucide-react";
import { paths } from "./paths.ts";

export interface NavItem {
  label: string;
  href: string;
  icon: LucideIcon;
  /** Marks the item active for nested URLs too (e.g. /tables/R32 under /tables). */
  matchPrefix?: boolean;
}

/** The app's sections, in the order a technician reaches for them. */
export const navigation: NavItem[] = [
  { label: "Today", href: paths.home.getHref(), icon: Home },
  { label: "P–T tables", href: paths.tables.getHref(), icon: Table2, matchPrefix: true },
  { label: "Safety", href: paths.safety.getHref(), icon: HardHat },
];
