"use client";

import { useRouter } from "next/navigation";
import { useRef, useState, type FormEvent } from "react";
import { FormField } from "@/components/ui/form-field";
import { itemInputClass, useHydrated } from "./item-controls";
import { sendCatalogWrite } from "./item-form-values";
import { checkBrandName } from "./lines-form-check";

/** Adds a brand through the API; a name another brand has, in any letter case, is refused there. */
export function LinesBrandAdd() {
  const router = useRouter();
  const hydrated = useHydrated();
  const inputRef = useRef<HTMLInputElement>(null);
  const [name, setName] = useState("");
  const [error, setError] = useState<string | undefined>();
  const [status, setStatus] = useState("");
  const [busy, setBusy] = useState(false);

  const refuse = (message: string | undefined) => {
    setError(message);
    inputRef.current?.focus();
  };

  async function submit(event: FormEvent) {
    event.preventDefault();
    setStatus("");
    const checked = checkBrandName(name);
    if (!checked.ok) return refuse(checked.errors.name);
    setBusy(true);
    const result = await sendCatalogWrite("POST", "/api/v1/brands", checked.body);
    setBusy(false);
    if (!result.ok) return refuse(result.message);
    setError(undefined);
    setName("");
    setStatus(`Added the brand ${checked.body.name}. Add its lines below.`);
    router.refresh();
  }

  return (
    <section aria-labelledby="brand-add-heading" className="max-w-3xl rounded border border-rule bg-sheet p-4 sm:p-6">
      <h2 id="brand-add-heading" className="text-xl font-semibold">
        Add a brand
      </h2>
      <form onSubmit={submit} noValidate className="mt-3 flex flex-wrap items-start gap-3">
        <div className="min-w-0 grow basis-60">
          <FormField id="brand-add-name" label="Brand name" error={error}>
            {(control) => (
              <input {...control} ref={inputRef} name="name" value={name} onChange={(event) => setName(event.target.value)} autoComplete="off" disabled={!hydrated} className={itemInputClass} />
            )}
          </FormField>
        </div>
        <button type="submit" disabled={busy || !hydrated} className="mt-7 min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90 disabled:opacity-60">
          {busy ? "Adding…" : "Add brand"}
        </button>
      </form>
      <p role="status" className="mt-2 text-ink-soft">
        {status}
      </p>
    </section>
  );
}
