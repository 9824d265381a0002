"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { primaryNav } from "./nav-items";

function isCurrent(pathname: string, href: string): boolean {
  return href === "/" ? pathname === "/" : pathname === href || pathname.startsWith(`${href}/`);
}

export function NavLinks() {
  const pathname = usePathname();
  return (
    <ul className="flex gap-1 overflow-x-auto text-sm [scrollbar-width:thin]">
      {primaryNav.map((item) => {
        const current = isCurrent(pathname, item.href);
        return (
          <li key={item.href} className="shrink-0">
            <Link
              href={item.href}
              prefetch={false}
              aria-current={current ? "page" : undefined}
              className={`inline-flex min-h-11 items-center rounded px-3 whitespace-nowrap hover:bg-accent-soft ${
                current ? "font-semibold text-accent underline decoration-2 underline-offset-8" : "text-ink-soft"
              }`}
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
