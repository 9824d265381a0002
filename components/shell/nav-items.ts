import { hasRole, type Role } from "@/lib/tire/vocabulary";

export interface NavItem {
  href: string;
  label: string;
  /** Shown only to people with this role (read in the browser; the route checks again on the server). */
  role?: Role;
}

export const primaryNav: readonly NavItem[] = [
  { href: "/", label: "Sidewall reader" },
  { href: "/compare", label: "Side-by-side" },
  { href: "/plus", label: "Plus planner" },
  { href: "/replace", label: "Replacement finder" },
  { href: "/learn", label: "Sidewall school" },
  { href: "/counter", label: "Counter", role: "staff" },
];

/** The screens someone with `role` (null: signed out, or not known yet) is shown in the main navigation. */
export function navFor(role: string | null): NavItem[] {
  return primaryNav.filter((item) => item.role === undefined || hasRole(role, item.role));
}

export function isCurrent(pathname: string, href: string): boolean {
  return href === "/" ? pathname === "/" : pathname === href || pathname.startsWith(`${href}/`);
}
