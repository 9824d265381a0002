"use client";

import dynamic from "next/dynamic";
import { useId, useImperativeHandle, useRef, useState, type Ref } from "react";
import type { QuoteContext } from "./post-quote-request";
import type { QuoteCatalogTire } from "./quote-tires";

// The form and its checks load when a driver opens it, keeping the pages' first load small.
const QuoteForm = dynamic(() => import("./quote-form"), {
  ssr: false,
  loading: () => (
    <p role="status" className="text-ink-soft">
      Opening the form…
    </p>
  ),
});

interface AskTheShopProps extends Omit<QuoteContext, "skus"> {
  /** The request's text about the tires, as the page fills it in. */
  tires: string;
  /** The catalog tires the page names (sent by SKU, shown with how many are on hand). */
  catalogTires?: QuoteCatalogTire[];
  /** How many tires the form starts with (the finder's set size); 4 when not given. */
  quantity?: number;
  /** For a page that opens the form from elsewhere (the finder's ask bar on a phone). */
  ref?: Ref<AskTheShopHandle>;
}

export interface AskTheShopHandle {
  /** Opens the form, brings it into view and moves focus to its heading's button. */
  open: () => void;
}

/** "Ask the shop for a price": a disclosure with the request form, filled in from the page it sits on. */
export function AskTheShop({ tires, catalogTires = [], quantity, ref, ...context }: AskTheShopProps) {
  const [open, setOpen] = useState(false);
  const toggle = useRef<HTMLButtonElement>(null);
  const section = useRef<HTMLElement>(null);
  useImperativeHandle(ref, () => ({
    open: () => {
      setOpen(true);
      section.current?.scrollIntoView({ block: "start" });
      toggle.current?.focus({ preventScroll: true });
    },
  }));
  const close = () => {
    setOpen(false);
    toggle.current?.focus();
  };
  const id = useId();
  const panelId = `${id}-panel`;
  return (
    <section ref={section} aria-labelledby={`${id}-title`} className="scroll-mt-4 rounded border border-rule bg-sheet p-4 print:hidden">
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        <button
          ref={toggle}
          type="button"
          aria-expanded={open}
          aria-controls={panelId}
          onClick={() => setOpen((value) => !value)}
          className="flex min-h-11 w-full items-center justify-between gap-3 text-left text-accent"
        >
          Ask the shop for a price
          <span aria-hidden="true" className="font-mono text-xl">
            {open ? "−" : "+"}
          </span>
        </button>
      </h2>
      {open ? null : <p className="text-ink-soft">Send these tires to the shop; it answers by e-mail with a price.</p>}
      <div id={panelId} hidden={!open} className="mt-3">
        {open ? <QuoteForm context={{ ...context, skus: catalogTires.map((tire) => tire.sku) }} tires={tires} catalogTires={catalogTires} quantity={quantity} onCancel={close} /> : null}
      </div>
    </section>
  );
}
