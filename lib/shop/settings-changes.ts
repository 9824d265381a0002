import { formatPrice } from "@/lib/money/money";
import { WEEKDAYS, type Weekday } from "@/lib/tire";
import type { ShopSettings, ShopSettingsChanges } from "./settings-schema";
import { formatTaxRate } from "./tax-percent";

/**
 * What a change of settings did, in the API's names and in words: the audit log records it and the
 * Counter's form says it after saving ("tax rate 7.25 % → 8 %"). Pure, so the browser uses it too.
 */
export interface SettingChange {
  /** The setting as the API names it; a part of the address as "address.town", a day's hours as "hours.sat". */
  field: string;
  from: unknown;
  to: unknown;
  words: string;
}

const DAY_WORDS: Record<Weekday, string> = { mon: "Monday", tue: "Tuesday", wed: "Wednesday", thu: "Thursday", fri: "Friday", sat: "Saturday", sun: "Sunday" };
const ADDRESS_WORDS = { streetAddress: "street address", town: "town", region: "region", postalCode: "postal code" } as const;
const CHARGE_WORDS = { fittingPerTireCents: "fitting", disposalPerTireCents: "disposal", tireFeePerTireCents: "tire fee" } as const;
const TEXT_WORDS = { name: "name", phone: "phone", email: "e-mail", timeZone: "time zone" } as const;

const dayText = (intervals: readonly (readonly [string, string])[]) =>
  intervals.length === 0 ? "closed" : intervals.map(([from, to]) => `${from}–${to}`).join(", ");
const taxedText = (taxed: boolean) => (taxed ? "taxed" : "not taxed");
const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** The settings after a PATCH: named settings replaced, the address and the week merged part by part, closed dates in order. */
export function applySettingsChanges(before: ShopSettings, changes: ShopSettingsChanges): ShopSettings {
  const { address, hours, closedDates, ...rest } = changes;
  return {
    ...before,
    ...rest,
    address: { ...before.address, ...address },
    hours: { ...before.hours, ...hours },
    closedDates: closedDates ? [...closedDates].sort() : before.closedDates,
  };
}

/** Every setting whose value differs, in the order the form shows them. */
export function settingChanges(before: ShopSettings, after: ShopSettings): SettingChange[] {
  const changes: SettingChange[] = [];
  const push = (field: string, from: unknown, to: unknown, words: string) => {
    if (!sameJson(from, to)) changes.push({ field, from, to, words });
  };
  push("name", before.name, after.name, `${TEXT_WORDS.name} “${before.name}” → “${after.name}”`);
  for (const part of Object.keys(ADDRESS_WORDS) as (keyof typeof ADDRESS_WORDS)[]) {
    push(`address.${part}`, before.address[part], after.address[part], `${ADDRESS_WORDS[part]} “${before.address[part]}” → “${after.address[part]}”`);
  }
  for (const field of ["phone", "email", "timeZone"] as const) push(field, before[field], after[field], `${TEXT_WORDS[field]} ${before[field]} → ${after[field]}`);
  for (const day of WEEKDAYS) push(`hours.${day}`, before.hours[day], after.hours[day], `${DAY_WORDS[day]} ${dayText(before.hours[day])} → ${dayText(after.hours[day])}`);
  const added = after.closedDates.filter((date) => !before.closedDates.includes(date));
  const removed = before.closedDates.filter((date) => !after.closedDates.includes(date));
  const dateWords = [...added.map((date) => `${date} added`), ...removed.map((date) => `${date} removed`)].join(", ");
  push("closedDates", before.closedDates, after.closedDates, `closed dates: ${dateWords || "reordered"}`);
  push("tolerancePct", before.tolerancePct, after.tolerancePct, `default tolerance ${before.tolerancePct} % → ${after.tolerancePct} %`);
  for (const field of Object.keys(CHARGE_WORDS) as (keyof typeof CHARGE_WORDS)[]) {
    push(field, before[field], after[field], `${CHARGE_WORDS[field]} ${formatPrice(before[field])} → ${formatPrice(after[field])} per tire`);
  }
  push("taxRateBp", before.taxRateBp, after.taxRateBp, `tax rate ${formatTaxRate(before.taxRateBp)} → ${formatTaxRate(after.taxRateBp)}`);
  push("taxServices", before.taxServices, after.taxServices, `fitting and disposal ${taxedText(before.taxServices)} → ${taxedText(after.taxServices)}`);
  push("fittingBays", before.fittingBays, after.fittingBays, `fitting bays ${before.fittingBays} → ${after.fittingBays}`);
  push("fittingMinutes", before.fittingMinutes, after.fittingMinutes, `minutes per fitting ${before.fittingMinutes} → ${after.fittingMinutes}`);
  push("leadMinutes", before.leadMinutes, after.leadMinutes, `earliest booking ${before.leadMinutes} → ${after.leadMinutes} minutes ahead`);
  push("cancelCutoffHours", before.cancelCutoffHours, after.cancelCutoffHours, `online cancelling until ${before.cancelCutoffHours} → ${after.cancelCutoffHours} hours before`);
  push("wearLimit32", before.wearLimit32, after.wearLimit32, `Wear match's default limit ${before.wearLimit32}/32 → ${after.wearLimit32}/32 in`);
  return changes;
}

/** "tax rate 7.25 % → 8 %; fitting $25.00 → $30.00 per tire". */
export const describeSettingChanges = (changes: readonly SettingChange[]): string => changes.map((change) => change.words).join("; ");
