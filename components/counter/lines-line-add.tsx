"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { useHydrated } from "./item-controls";
import { sendCatalogWrite } from "./item-form-values";
import { checkNewLine, EMPTY_LINE, refusalErrors, type LineFormValues } from "./lines-form-check";
import { LinesLineForm, type LineFormErrors } from "./lines-line-form";

/** "Add a line" under a brand: opens the line form, posts it, and says what was added. */
export function LinesLineAdd({ brandId, brandName }: { brandId: number; brandName: string }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const [open, setOpen] = useState(false);
  const [status, setStatus] = useState("");
  const toggleRef = useRef<HTMLButtonElement>(null);

  function close() {
    setOpen(false);
    requestAnimationFrame(() => toggleRef.current?.focus());
  }

  async function add(values: LineFormValues): Promise<LineFormErrors | null> {
    const checked = checkNewLine(values);
    if (!checked.ok) return checked.errors;
    const result = await sendCatalogWrite("POST", `/api/v1/brands/${brandId}/lines`, checked.body);
    if (!result.ok) return refusalErrors(result);
    setStatus(`Added the line ${brandName} ${checked.body.name}.`);
    close();
    router.refresh();
    return null;
  }

  return (
    <div className="flex flex-col gap-2">
      {open ? (
        <LinesLineForm idPrefix={`brand-${brandId}-new-line`} label={`New line for ${brandName}`} initial={EMPTY_LINE} submitLabel="Add line" onSubmit={add} onCancel={close} />
      ) : (
        <button
          ref={toggleRef}
          type="button"
          onClick={() => {
            setStatus("");
            setOpen(true);
          }}
          disabled={!hydrated}
          className="min-h-11 self-start rounded border border-accent px-4 font-semibold text-accent disabled:opacity-60"
        >
          Add a line <span className="sr-only">to {brandName}</span>
        </button>
      )}
      <p role="status" className="text-sm text-ink-soft">
        {status}
      </p>
    </div>
  );
}
