"use client";

import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { useHydrated } from "./item-controls";
import { sendCatalogWrite } from "./item-form-values";

/** Retires an item after a second, explicit confirmation; its history stays in the audit log. */
export function ItemRetire({ sku }: { sku: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState("");
  const confirmRef = useRef<HTMLButtonElement>(null);
  const hydrated = useHydrated();

  useEffect(() => {
    if (confirming) confirmRef.current?.focus();
  }, [confirming]);

  async function retire() {
    setBusy(true);
    const result = await sendCatalogWrite("DELETE", `/api/v1/catalog/${encodeURIComponent(sku)}`);
    if (result.ok) {
      router.push(`/counter?retired=${encodeURIComponent(sku)}`);
      return;
    }
    setBusy(false);
    setError(result.message);
  }

  return (
    <section aria-labelledby="retire-heading" className="mt-8 max-w-3xl rounded border border-danger/60 p-4 sm:p-6">
      <h2 id="retire-heading" className="text-xl font-semibold">
        Retire this item
      </h2>
      <p className="mt-1 text-ink-soft">A retired item leaves the catalog and the Replacement finder. Its SKU and its history are kept.</p>
      {confirming ? (
        <div className="mt-3 flex flex-wrap items-center gap-4">
          <p className="w-full font-semibold">Retire {sku} now?</p>
          <button ref={confirmRef} type="button" onClick={() => void retire()} disabled={busy} className="min-h-11 rounded bg-danger px-4 font-semibold text-sheet disabled:opacity-60">
            {busy ? "Retiring…" : `Yes, retire ${sku}`}
          </button>
          <button type="button" onClick={() => setConfirming(false)} disabled={busy} className="min-h-11 rounded border border-rule px-4 font-semibold">
            Keep it
          </button>
        </div>
      ) : (
        <button type="button" onClick={() => setConfirming(true)} disabled={!hydrated} className="mt-3 min-h-11 rounded border border-danger px-4 font-semibold text-danger">
          Retire this item
        </button>
      )}
      <p role="alert" className="mt-2 text-danger">
        {error}
      </p>
    </section>
  );
}
