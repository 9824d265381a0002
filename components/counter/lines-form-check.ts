import type { z } from "zod";
import { lineChangesSchema, newBrandSchema, newLineSchema, type BrandNameBody, type ListedLine, type NewLineBody } from "@/lib/brands/brand-bodies";
import { SEASONS, TERRAINS, type Season, type Terrain } from "@/lib/tire";

/** A line's fields as its form holds them. */
export interface LineFormValues {
  name: string;
  season: Season;
  terrain: Terrain;
  threePeak: boolean;
  /** Whole 32nds as typed; empty while unknown. */
  treadDepth32: string;
}

export type LineField = keyof LineFormValues;
export type Checked<T, F extends string> = { ok: true; body: T } | { ok: false; errors: Partial<Record<F, string>> };

export const EMPTY_LINE: LineFormValues = { name: "", season: SEASONS[0], terrain: TERRAINS[0], threePeak: false, treadDepth32: "" };

export const lineFormValues = (line: ListedLine): LineFormValues => ({
  name: line.name,
  season: line.season,
  terrain: line.terrain,
  threePeak: line.threePeak,
  treadDepth32: line.treadDepth32 === null ? "" : String(line.treadDepth32),
});

/** A refusal from the API placed on the field it names, or on the whole form. */
export const refusalErrors = (refusal: { field: string | null; message: string }): Partial<Record<LineField | "form", string>> =>
  refusal.field !== null && refusal.field in EMPTY_LINE ? { [refusal.field]: refusal.message } : { form: refusal.message };

const sentence = (text: string) => `${text.charAt(0).toUpperCase()}${text.slice(1)}.`;

/** Checks a body with the API's own schema; each field's first problem, as a sentence. */
function check<S extends z.ZodType, F extends string>(schema: S, body: unknown): Checked<z.infer<S>, F> {
  const parsed = schema.safeParse(body);
  if (parsed.success) return { ok: true, body: parsed.data };
  const errors: Partial<Record<F, string>> = {};
  for (const issue of parsed.error.issues) {
    const field = String(issue.path[0] ?? "name") as F;
    errors[field] ??= sentence(issue.message);
  }
  return { ok: false, errors };
}

export const checkBrandName = (name: string): Checked<BrandNameBody, "name"> => check(newBrandSchema, { name });

/** The tread depth as a number, null when left empty, or the text itself when it is not digits (the schema refuses it). */
function depthValue(text: string): number | null | string {
  const trimmed = text.trim();
  if (trimmed === "") return null;
  return /^\d{1,3}$/.test(trimmed) ? Number(trimmed) : trimmed;
}

/** A new line's body, checked as the API will check it. */
export const checkNewLine = (values: LineFormValues): Checked<NewLineBody, LineField> =>
  check(newLineSchema, { ...values, treadDepth32: depthValue(values.treadDepth32) });

/** The fields that differ from the line as it is, checked as the API will check them; none → nothing to send. */
export function checkLineChanges(values: LineFormValues, line: ListedLine): Checked<Partial<NewLineBody>, LineField> | { ok: true; body: null } {
  const wanted = { ...values, treadDepth32: depthValue(values.treadDepth32) };
  const current = { ...lineFormValues(line), treadDepth32: line.treadDepth32 };
  const changes = Object.fromEntries(Object.entries(wanted).filter(([field, value]) => current[field as LineField] !== value));
  if (Object.keys(changes).length === 0) return { ok: true, body: null };
  return check(lineChangesSchema, changes);
}
