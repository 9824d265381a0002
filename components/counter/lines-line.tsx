"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import type { ListedLine } from "@/lib/brands/brand-bodies";
import { useHydrated } from "./item-controls";
import { sendCatalogWrite } from "./item-form-values";
import { checkLineChanges, lineFormValues, refusalErrors, type LineFormValues } from "./lines-form-check";
import { LinesLineForm, type LineFormErrors } from "./lines-line-form";

const buttonClass = "min-h-11 rounded border border-rule px-3 font-semibold disabled:opacity-60";

/** "all-season · highway · 3PMSF · 10/32 in new" */
function attributes(line: ListedLine): string {
  const depth = line.treadDepth32 === null ? "tread depth not given" : `${line.treadDepth32}/32 in new`;
  return [line.season, line.terrain, line.threePeak ? "3PMSF" : "no 3PMSF", depth].join(" · ");
}

/** One line of a brand: what it is made for, changed in place, retired or un-retired with one press. */
export function LinesLine({ line, brandName }: { line: ListedLine; brandName: string }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const [editing, setEditing] = useState(false);
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<{ text: string; error?: true }>({ text: "" });
  const changeRef = useRef<HTMLButtonElement>(null);
  const label = `${brandName} ${line.name}`;

  function closeForm() {
    setEditing(false);
    requestAnimationFrame(() => changeRef.current?.focus());
  }

  async function change(values: LineFormValues): Promise<LineFormErrors | null> {
    const checked = checkLineChanges(values, line);
    if (!checked.ok) return checked.errors;
    if (checked.body) {
      const result = await sendCatalogWrite("PATCH", `/api/v1/lines/${line.id}`, checked.body);
      if (!result.ok) return refusalErrors(result);
      setStatus({ text: `Saved the line ${brandName} ${checked.body.name ?? line.name}.` });
      router.refresh();
    }
    closeForm();
    return null;
  }

  async function setRetired(retired: boolean) {
    setBusy(true);
    const result = await sendCatalogWrite("PATCH", `/api/v1/lines/${line.id}`, { retired });
    setBusy(false);
    if (!result.ok) return setStatus({ text: result.message, error: true });
    setStatus({
      text: retired
        ? `Retired ${label}: it takes no new items; its items stay listed and for sale. Un-retire it to add items again.`
        : `${label} is back in use: new items may be added to it.`,
    });
    router.refresh();
  }

  return (
    <li className="flex flex-col gap-2 border-t border-grid py-3" data-line-id={line.id}>
      <div className="flex flex-col gap-2 sm:flex-row sm:items-center sm:justify-between">
        <div className="min-w-0">
          <p className="flex flex-wrap items-center gap-2 font-semibold">
            {line.name}
            {line.retired ? <span className="rounded border border-caution px-2 text-sm font-semibold text-caution">Retired</span> : null}
          </p>
          <p className="text-sm text-ink-soft">{attributes(line)}</p>
        </div>
        <div className="flex shrink-0 flex-wrap gap-2">
          <button ref={changeRef} type="button" onClick={() => setEditing(true)} disabled={!hydrated || editing} className={buttonClass}>
            Change <span className="sr-only">{label}</span>
          </button>
          <button type="button" onClick={() => void setRetired(!line.retired)} disabled={!hydrated || busy} className={buttonClass}>
            {line.retired ? "Un-retire" : "Retire"} <span className="sr-only">{label}</span>
          </button>
        </div>
      </div>
      {editing ? (
        <LinesLineForm idPrefix={`line-${line.id}`} label={`Change ${label}`} initial={lineFormValues(line)} submitLabel="Save line" onSubmit={change} onCancel={closeForm} />
      ) : null}
      <p role="status" className={`text-sm ${status.error ? "text-danger" : "text-ink-soft"}`}>
        {status.text}
      </p>
    </li>
  );
}
