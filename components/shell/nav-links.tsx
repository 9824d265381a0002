import Link from "next/link";
import { isCurrent, type NavItem } from "./nav-items";

/** The main navigation's links: a column in the phone menu, a row from the large breakpoint up. */
export function NavLinks({ items, pathname, onNavigate }: { items: readonly NavItem[]; pathname: string; onNavigate: () => void }) {
  return (
    <ul className="flex flex-col text-base lg:flex-row lg:flex-wrap lg:gap-1 lg:text-sm">
      {items.map((item) => {
        const current = isCurrent(pathname, item.href);
        return (
          <li key={item.href}>
            <Link
              href={item.href}
              prefetch={false}
              onClick={onNavigate}
              aria-current={current ? "page" : undefined}
              className={`flex min-h-11 items-center rounded px-3 whitespace-nowrap hover:bg-accent-soft ${
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
