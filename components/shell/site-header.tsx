import Link from "next/link";
import { AccountMenu } from "@/components/auth/account-menu";
import { BrandMark } from "./brand-mark";
import { NavLinks } from "./nav-links";

export function SiteHeader() {
  return (
    <header className="border-b border-rule bg-sheet/95 print:hidden">
      <div className="mx-auto flex max-w-6xl flex-col gap-1 px-4 pt-3 sm:flex-row sm:items-center sm:gap-6 sm:py-2">
        <Link href="/" className="inline-flex min-h-11 items-center gap-2 self-start font-semibold tracking-tight">
          <BrandMark className="size-7 text-accent" />
          <span className="text-lg">Sidewise</span>
        </Link>
        <nav aria-label="Main" className="-mx-2 min-w-0">
          <NavLinks />
        </nav>
        <div className="pb-2 sm:ml-auto sm:pb-0">
          <AccountMenu />
        </div>
      </div>
    </header>
  );
}
