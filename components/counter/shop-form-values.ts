import { centsToDollarsText, parseDollars } from "@/lib/money/money";
import { applySettingsChanges, settingChanges, type SettingChange } from "@/lib/shop/settings-changes";
import type { ShopSettings, ShopSettingsChanges } from "@/lib/shop/settings-schema";
import { FITTING_LIMITS, MAX_CHARGE_CENTS, WEAR_LIMIT_32 } from "@/lib/shop/limits";
import type { ShopContact } from "@/lib/shop/queries";
import { parseTaxPercent, taxPercentText } from "@/lib/shop/tax-percent";
import { closedDatesProblem, dayHoursProblem } from "@/lib/shop/week-rules";
import { WEEKDAYS, type Weekday } from "@/lib/tire";

/** The fitting settings, whole numbers the form holds as typed, with the limits the API and the database keep. */
export const FITTING_FIELDS = [
  { field: "fittingBays", label: "Fitting bays", what: "the number of bays", limits: FITTING_LIMITS.bays, hint: "How many sets can be fitted at the same time." },
  { field: "fittingMinutes", label: "Minutes per fitting", what: "the minutes one set takes", limits: FITTING_LIMITS.minutes, hint: "How long one set takes; fitting times start this far apart." },
  { field: "leadMinutes", label: "Earliest booking (minutes ahead)", what: "the minutes ahead", limits: FITTING_LIMITS.leadMinutes, hint: "A driver books no sooner than this from now; 120 is two hours." },
  {
    field: "cancelCutoffHours",
    label: "Cancel online until (hours before)",
    what: "the hours before a fitting",
    limits: FITTING_LIMITS.cancelCutoffHours,
    hint: "Closer to the fitting, a driver phones to cancel; 0 allows cancelling online until it starts.",
  },
] as const;

type FittingField = (typeof FITTING_FIELDS)[number]["field"];

/** The settings as the form holds them: text as typed, charges in dollars, the tax rate in percent. */
export interface ShopFormValues extends Omit<ShopContact, "openingHours">, Record<FittingField, string> {
  timeZone: string;
  hours: Record<Weekday, [string, string][]>;
  closedDates: string[];
  tolerancePct: string;
  wearLimit32: string;
  fittingPerTire: string;
  disposalPerTire: string;
  tireFeePerTire: string;
  taxPercent: string;
  taxServices: boolean;
}

/** Errors by the API's field names ("address.town", "hours.sat", "taxRateBp"), and "form" for the rest. */
export type ShopFormErrors = Partial<Record<string, string>>;

export const CHARGE_FIELDS = [
  { value: "fittingPerTire", field: "fittingPerTireCents", label: "Fitting per tire", what: "fitting" },
  { value: "disposalPerTire", field: "disposalPerTireCents", label: "Disposal per old tire", what: "disposal" },
  { value: "tireFeePerTire", field: "tireFeePerTireCents", label: "Tire fee per new tire (never taxed)", what: "the tire fee" },
] as const;

export function formValuesOf(settings: ShopSettings): ShopFormValues {
  return {
    name: settings.name,
    ...settings.address,
    phone: settings.phone,
    email: settings.email,
    timeZone: settings.timeZone,
    hours: settings.hours,
    closedDates: settings.closedDates,
    tolerancePct: String(settings.tolerancePct),
    wearLimit32: String(settings.wearLimit32),
    fittingPerTire: centsToDollarsText(settings.fittingPerTireCents),
    disposalPerTire: centsToDollarsText(settings.disposalPerTireCents),
    tireFeePerTire: centsToDollarsText(settings.tireFeePerTireCents),
    taxPercent: taxPercentText(settings.taxRateBp),
    taxServices: settings.taxServices,
    ...(Object.fromEntries(FITTING_FIELDS.map(({ field }) => [field, String(settings[field])])) as Record<FittingField, string>),
  };
}

const sentence = (text: string) => `${text.charAt(0).toUpperCase()}${text.slice(1)}.`;

/** Where a refusal from the API goes in the form: "hours.sat.1.0" → "hours.sat", "closedDates.2" → "closedDates". */
export function formFieldOf(apiField: string | null | undefined): string {
  if (!apiField || apiField === "body") return "form";
  const [head, part] = apiField.split(".");
  if (head === "hours" || head === "address") return part ? `${head}.${part}` : head;
  return head ?? "form";
}

export type ShopFormCheck =
  | { ok: true; body: ShopSettingsChanges | null; changes: SettingChange[] }
  | { ok: false; errors: ShopFormErrors };

/**
 * Reads the form as the API will and finds what differs from the settings it started from: the
 * PATCH body names only those (null when nothing changed), so a colleague's change to another
 * setting in the meantime is kept.
 */
export function checkShopForm(values: ShopFormValues, initial: ShopSettings): ShopFormCheck {
  const errors: ShopFormErrors = {};
  const required = (field: string, value: string, what: string) => {
    if (value.trim() === "") errors[field] = `Enter ${what}.`;
  };
  required("name", values.name, "the shop's name");
  required("address.streetAddress", values.streetAddress, "the street address");
  required("address.town", values.town, "the town");
  required("address.region", values.region, "the region (state)");
  required("address.postalCode", values.postalCode, "the postal code");
  required("phone", values.phone, "the phone number");
  required("email", values.email, "the shop's e-mail address");
  required("timeZone", values.timeZone, "the time zone, such as America/New_York");
  for (const day of WEEKDAYS) {
    const problem = dayHoursProblem(values.hours[day]);
    if (problem) errors[`hours.${day}`] = sentence(problem.message);
  }
  const datesProblem = closedDatesProblem(values.closedDates);
  if (datesProblem) errors.closedDates = sentence(datesProblem.message);
  const tolerance = /^\d(?:\.\d+)?$/.test(values.tolerancePct.trim()) ? Number(values.tolerancePct.trim()) : NaN;
  if (!(tolerance >= 1 && tolerance <= 5)) errors.tolerancePct = "Enter a tolerance from 1 to 5 %, like 3 or 2.5.";
  const wearLimit = /^\d(?:\.[05])?$/.test(values.wearLimit32.trim()) ? Number(values.wearLimit32.trim()) : NaN;
  if (!(wearLimit >= WEAR_LIMIT_32.min && wearLimit <= WEAR_LIMIT_32.max)) {
    errors.wearLimit32 = `Enter the limit in 32nds of an inch from ${WEAR_LIMIT_32.min} to ${WEAR_LIMIT_32.max}, whole or a half, like 2 or 2.5.`;
  }
  const cents: Partial<Record<(typeof CHARGE_FIELDS)[number]["field"], number>> = {};
  for (const charge of CHARGE_FIELDS) {
    const parsed = parseDollars(values[charge.value]);
    if (parsed === null || parsed > MAX_CHARGE_CENTS) errors[charge.field] = `Enter ${charge.what} in dollars, like 25.00, at most $1,000.00.`;
    else cents[charge.field] = parsed;
  }
  const taxRateBp = parseTaxPercent(values.taxPercent);
  if (taxRateBp === null) errors.taxRateBp = "Enter the tax rate in percent from 0 to 100, with at most two decimals, like 7.25.";
  const fitting: Partial<Record<FittingField, number>> = {};
  for (const { field, what, limits } of FITTING_FIELDS) {
    const number = /^\d{1,6}$/.test(values[field].trim()) ? Number(values[field].trim()) : NaN;
    if (number >= limits.min && number <= limits.max) fitting[field] = number;
    else errors[field] = `Enter ${what}, a whole number from ${limits.min} to ${limits.max}.`;
  }
  if (Object.keys(errors).length > 0 || taxRateBp === null) return { ok: false, errors };

  const trimmed = (text: string) => text.trim();
  const after = applySettingsChanges(initial, {
    name: trimmed(values.name),
    address: { streetAddress: trimmed(values.streetAddress), town: trimmed(values.town), region: trimmed(values.region), postalCode: trimmed(values.postalCode) },
    phone: trimmed(values.phone),
    email: trimmed(values.email),
    timeZone: trimmed(values.timeZone),
    hours: values.hours,
    closedDates: values.closedDates,
    tolerancePct: tolerance,
    wearLimit32: wearLimit,
    ...cents,
    taxRateBp,
    taxServices: values.taxServices,
    ...fitting,
  });
  const changes = settingChanges(initial, after);
  return { ok: true, body: changes.length === 0 ? null : changedSettingsOf(after, changes), changes };
}

/** The PATCH body for the changed settings: whole values, a part of the address or a day of the week. */
function changedSettingsOf(after: ShopSettings, changes: readonly SettingChange[]): ShopSettingsChanges {
  const body: Record<string, unknown> = {};
  for (const { field } of changes) {
    const [head, part] = field.split(".") as [keyof ShopSettings, string | undefined];
    if (part === undefined) body[head] = after[head];
    else body[head] = { ...(body[head] as object | undefined), [part]: (after[head] as Record<string, unknown>)[part] };
  }
  return body as ShopSettingsChanges;
}
