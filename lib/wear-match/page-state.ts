import { readMeasurableSize } from "@/lib/tire";
import { evaluateWearMatch, type WearMatchEvaluation, wearMatchQuerySchema } from "./wear-match-api";

export const WEAR_MATCH_FIELDS = ["size", "newTreadDepth32", "remaining32", "limit32", "limitCircumferenceMm"] as const;
export type WearMatchField = (typeof WEAR_MATCH_FIELDS)[number];

export interface WearMatchPageState {
  /** What the address holds, as typed, to fill the form back in. */
  typed: Partial<Record<WearMatchField, string>>;
  /** One message per field that is wrong, saying what to give instead. */
  errors: Partial<Record<WearMatchField, string>>;
  /** The judgement, once the form has been filled in right. */
  answer: Extract<WearMatchEvaluation, { ok: true }> | null;
}

type SearchParams = Record<string, string | string[] | undefined>;

/** Reads /wear-match's address with the API's own rules; nothing typed yet is no error. */
export function readWearMatchPage(searchParams: SearchParams, shopLimit32: number): WearMatchPageState {
  const typed: WearMatchPageState["typed"] = {};
  for (const field of WEAR_MATCH_FIELDS) {
    const value = searchParams[field];
    const text = (Array.isArray(value) ? value[0] : value)?.slice(0, 200);
    if (text !== undefined && text.trim() !== "") typed[field] = text;
  }
  if (typed.size === undefined && typed.newTreadDepth32 === undefined && typed.remaining32 === undefined) return { typed, errors: {}, answer: null };
  const parsed = wearMatchQuerySchema.safeParse(typed);
  if (!parsed.success) {
    const errors: WearMatchPageState["errors"] = {};
    for (const issue of parsed.error.issues) {
      const field = issue.path[0] as WearMatchField;
      errors[field] ??= typed[field] === undefined ? "Fill this in." : `${issue.message.charAt(0).toUpperCase()}${issue.message.slice(1)}.`;
    }
    const size = typed.size === undefined ? null : readMeasurableSize(typed.size);
    if (size && !size.ok) errors.size ??= size.message;
    return { typed, errors, answer: null };
  }
  const answer = evaluateWearMatch(parsed.data, shopLimit32);
  return answer.ok ? { typed, errors: {}, answer } : { typed, errors: { size: answer.message }, answer: null };
}
