"use client";

import { usePathname } from "next/navigation";
import { useEffect, useId, useRef, useState, type KeyboardEvent } from "react";
import { AccountMenu } from "@/components/auth/account-menu";
import { useBrowserSession } from "@/components/auth/use-browser-session";
import { navFor } from "./nav-items";
import { NavLinks } from "./nav-links";

const isShown = (element: HTMLElement) => element.getClientRects().length > 0;

/**
 * The main navigation and the account menu. Below the large breakpoint they sit behind one Menu
 * button: focus stays inside while it is open; Escape closes it and returns to the button, as do a
 * link followed and a click outside. Staff-only screens are decided from the session in the
 * browser, so every public page stays the same static page for everyone.
 */
export function SiteNav() {
  const [session, setSession] = useBrowserSession();
  const pathname = usePathname();
  // Open on the page it was opened on: moving to another page closes it, Back and Forward included.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === pathname;
  const navRef = useRef<HTMLElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const panelId = useId();

  useEffect(() => {
    if (!open) return;
    const closeOutside = (event: PointerEvent) => {
      if (!navRef.current?.contains(event.target as Node)) setOpenOn(null);
    };
    document.addEventListener("pointerdown", closeOutside);
    return () => document.removeEventListener("pointerdown", closeOutside);
  }, [open]);

  function keepFocusInside(event: KeyboardEvent<HTMLElement>) {
    const button = buttonRef.current;
    if (!open || !button || !isShown(button)) return;
    if (event.key === "Escape") {
      setOpenOn(null);
      button.focus();
      return;
    }
    if (event.key !== "Tab") return;
    const focusable = [...navRef.current!.querySelectorAll<HTMLElement>("a[href], button:not([disabled])")].filter(isShown);
    const first = focusable[0];
    const last = focusable[focusable.length - 1];
    if (event.shiftKey && document.activeElement === first) {
      event.preventDefault();
      last?.focus();
    } else if (!event.shiftKey && document.activeElement === last) {
      event.preventDefault();
      first?.focus();
    }
  }

  return (
    <nav ref={navRef} aria-label="Main" onKeyDown={keepFocusInside} className="lg:min-w-0 lg:flex-1">
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpenOn(open ? null : pathname)}
        className="inline-flex min-h-11 items-center gap-2 rounded border border-rule bg-sheet px-3 font-semibold text-ink hover:bg-accent-soft lg:hidden"
      >
        <MenuIcon open={open} />
        Menu
      </button>
      <div
        id={panelId}
        className={`${open ? "flex" : "hidden"} absolute inset-x-0 top-full z-40 flex-col gap-2 border-b border-rule bg-sheet px-4 py-3 shadow-lg lg:static lg:flex lg:flex-row lg:items-center lg:justify-between lg:gap-4 lg:border-0 lg:bg-transparent lg:p-0 lg:shadow-none`}
      >
        <NavLinks items={navFor(typeof session === "object" ? session.role : null)} pathname={pathname} onNavigate={() => setOpenOn(null)} />
        <div className="border-t border-rule pt-2 pl-1 lg:border-0 lg:pt-0 lg:pl-0">
          <AccountMenu state={session} onChange={setSession} />
        </div>
      </div>
    </nav>
  );
}

function MenuIcon({ open }: { open: boolean }) {
  return (
    <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true" focusable="false">
      <path d={open ? "M4 4l12 12M16 4L4 16" : "M3 5h14M3 10h14M3 15h14"} stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
    </svg>
  );
}
