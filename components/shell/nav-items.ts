export interface NavItem {
  href: string;
  label: string;
}

export const primaryNav: readonly NavItem[] = [
  { href: "/", label: "Sidewall reader" },
  { href: "/compare", label: "Side-by-side" },
  { href: "/plus", label: "Plus planner" },
  { href: "/replace", label: "Replacement finder" },
  { href: "/learn", label: "Sidewall school" },
  { href: "/counter", label: "Counter" },
];
