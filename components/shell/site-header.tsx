import Link from "next/link";
import { BrandMark } from "./brand-mark";
import { SiteNav } from "./site-nav";

export function SiteHeader() {
  return (
    <header className="relative border-b border-rule bg-sheet/95 print:hidden">
      <div className="mx-auto flex max-w-6xl items-center justify-between gap-6 px-4 py-2">
        <Link href="/" className="inline-flex min-h-11 shrink-0 items-center gap-2 font-semibold tracking-tight">
          <BrandMark className="size-7 text-accent" />
          <span className="text-lg">Sidewise</span>
        </Link>
        <SiteNav />
      </div>
    </header>
  );
}
