import { FormField, fieldClass } from "@/components/ui/form-field";
import type { WearMatchPageState } from "@/lib/wear-match/page-state";

/**
 * A plain GET form: the address holds every answer, so the page works without JavaScript, survives a
 * reload and can be sent as a link. The server checks the fields with the API's own rules.
 */
export function WearMatchForm({ state, shopLimit32 }: { state: WearMatchPageState; shopLimit32: number }) {
  const { typed, errors } = state;
  return (
    <form method="get" action="/wear-match" className="grid gap-4 rounded border border-rule bg-sheet p-4 sm:grid-cols-2" noValidate>
      <FormField id="wear-size" label="Tire size" hint="The size on every tire of the vehicle, e.g. 225/65R17." error={errors.size}>
        {(control) => <input {...control} name="size" defaultValue={typed.size ?? ""} autoComplete="off" spellCheck={false} className={`${fieldClass} font-mono`} />}
      </FormField>
      <FormField id="wear-new" label="New tire's tread depth (32nds of an inch)" hint="From the tire maker's data, e.g. 10 or 11.5." error={errors.newTreadDepth32}>
        {(control) => <input {...control} name="newTreadDepth32" defaultValue={typed.newTreadDepth32 ?? ""} inputMode="decimal" autoComplete="off" className={fieldClass} />}
      </FormField>
      <FormField
        id="wear-remaining"
        label="Depths left on the tires that stay (32nds)"
        hint="Two or three readings, the lowest of each tire, separated by commas: 6, 6.5, 7."
        error={errors.remaining32}
      >
        {(control) => <input {...control} name="remaining32" defaultValue={typed.remaining32 ?? ""} inputMode="decimal" autoComplete="off" className={fieldClass} />}
      </FormField>
      <fieldset className="flex flex-col gap-3 sm:col-span-2">
        <legend className="font-semibold">The vehicle maker&apos;s limit (leave both empty for the shop&apos;s {shopLimit32}/32 in)</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <FormField id="wear-limit-depth" label="Tread-depth difference (32nds)" error={errors.limit32}>
            {(control) => <input {...control} name="limit32" defaultValue={typed.limit32 ?? ""} inputMode="decimal" autoComplete="off" className={fieldClass} />}
          </FormField>
          <FormField id="wear-limit-circumference" label="or circumference difference (mm)" error={errors.limitCircumferenceMm}>
            {(control) => (
              <input {...control} name="limitCircumferenceMm" defaultValue={typed.limitCircumferenceMm ?? ""} inputMode="decimal" autoComplete="off" className={fieldClass} />
            )}
          </FormField>
        </div>
      </fieldset>
      <div className="sm:col-span-2">
        <button type="submit" className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet">
          Check the match
        </button>
      </div>
    </form>
  );
}
