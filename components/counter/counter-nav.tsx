"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

const sections = [
  { href: "/counter", label: "Catalog", adminOnly: false },
  { href: "/counter/lines", label: "Lines", adminOnly: false },
  { href: "/counter/import", label: "Import & export", adminOnly: false },
  { href: "/counter/cards", label: "Fit cards", adminOnly: false },
  { href: "/counter/requests", label: "Requests", adminOnly: false },
  { href: "/counter/fittings", label: "Fittings", adminOnly: false },
  { href: "/counter/outbox", label: "Outbox", adminOnly: false },
  { href: "/counter/team", label: "Team", adminOnly: true },
  { href: "/counter/audit", label: "Audit log", adminOnly: true },
  { href: "/counter/shop", label: "Shop", adminOnly: true },
];

function isCurrent(pathname: string, href: string): boolean {
  if (href === "/counter") return pathname === "/counter" || pathname.startsWith("/counter/items");
  return pathname.startsWith(href);
}

/** The Counter's own sections; admins also see Team, Audit log and Shop. */
export function CounterNav({ isAdmin }: { isAdmin: boolean }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Counter sections" className="mb-6 overflow-x-auto border-b border-rule">
      <ul className="flex min-w-max gap-1">
        {sections
          .filter((section) => isAdmin || !section.adminOnly)
          .map((section) => {
            const current = isCurrent(pathname, section.href);
            return (
              <li key={section.href}>
                <Link
                  href={section.href}
                  prefetch={false}
                  aria-current={current ? "page" : undefined}
                  className={`inline-flex min-h-11 items-center border-b-2 px-3 font-semibold ${
                    current ? "border-accent text-accent" : "border-transparent text-ink-soft hover:text-ink"
                  }`}
                >
                  {section.label}
                </Link>
              </li>
            );
          })}
      </ul>
    </nav>
  );
}
