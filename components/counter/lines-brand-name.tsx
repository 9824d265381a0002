"use client";

import { useRouter } from "next/navigation";
import { useEffect, useRef, useState, type FormEvent, type KeyboardEvent } from "react";
import { FormField } from "@/components/ui/form-field";
import { itemInputClass, useHydrated } from "./item-controls";
import { sendCatalogWrite } from "./item-form-values";
import { checkBrandName } from "./lines-form-check";

const buttonClass = "min-h-11 rounded border border-rule px-3 font-semibold disabled:opacity-60";

/**
 * A brand's name as its section's heading, renamed in place: "Rename" opens a field with the name,
 * Enter saves, Escape (or Cancel) leaves it as it was; focus comes back to "Rename" either way.
 */
export function LinesBrandName({ id, name, headingId }: { id: number; name: string; headingId: string }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(name);
  const [error, setError] = useState<string | undefined>();
  const [status, setStatus] = useState("");
  const [busy, setBusy] = useState(false);
  const inputRef = useRef<HTMLInputElement>(null);
  const renameRef = useRef<HTMLButtonElement>(null);
  const returnFocus = useRef(false);

  useEffect(() => {
    if (editing) inputRef.current?.select();
    else if (returnFocus.current) renameRef.current?.focus();
    returnFocus.current = false;
  }, [editing]);

  function open() {
    setText(name);
    setError(undefined);
    setStatus("");
    setEditing(true);
  }

  function close() {
    returnFocus.current = true;
    setEditing(false);
  }

  const refuse = (message: string | undefined) => {
    setError(message);
    inputRef.current?.focus();
  };

  async function save(event: FormEvent) {
    event.preventDefault();
    const checked = checkBrandName(text);
    if (!checked.ok) return refuse(checked.errors.name);
    if (checked.body.name === name) return close();
    setBusy(true);
    const result = await sendCatalogWrite("PATCH", `/api/v1/brands/${id}`, checked.body);
    setBusy(false);
    if (!result.ok) return refuse(result.message);
    setStatus(`Renamed ${name} to ${checked.body.name}.`);
    close();
    router.refresh();
  }

  function cancelOnEscape(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key === "Escape") close();
  }

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <h2 id={headingId} className="text-2xl font-semibold">
          {name}
        </h2>
        {editing ? null : (
          <button ref={renameRef} type="button" onClick={open} disabled={!hydrated} className={buttonClass}>
            Rename <span className="sr-only">{name}</span>
          </button>
        )}
      </div>
      {editing ? (
        <form onSubmit={save} noValidate className="flex max-w-xl flex-wrap items-start gap-3">
          <div className="min-w-0 grow basis-56">
            <FormField id={`brand-${id}-rename`} label={`New name for ${name}`} hint="Enter saves, Escape cancels." error={error}>
              {(control) => (
                <input {...control} ref={inputRef} value={text} onChange={(event) => setText(event.target.value)} onKeyDown={cancelOnEscape} autoComplete="off" className={itemInputClass} />
              )}
            </FormField>
          </div>
          <div className="mt-7 flex gap-2">
            <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90 disabled:opacity-60">
              {busy ? "Saving…" : "Save name"}
            </button>
            <button type="button" onClick={close} disabled={busy} className={buttonClass}>
              Cancel
            </button>
          </div>
        </form>
      ) : null}
      <p role="status" className="text-sm text-ink-soft">
        {status}
      </p>
    </div>
  );
}
