import { z } from "zod";
import { SEASONS, TERRAINS } from "@/lib/tire";
import { lineText } from "@/lib/validation/text";
import { treadDepth32Schema } from "@/lib/validation/tread-depth";

export const BRAND_NAME_MAX = 40;
export const LINE_NAME_MAX = 60;

/**
 * A brand's or a line's name as stored: one line of text, trimmed, with runs of spaces made one (so
 * that "Quensal" and " Quensal " cannot become two brands), holding a letter or a digit. The
 * database compares names without case (db/schema/catalog.ts).
 */
function nameSchema(what: "brand" | "line", max: number) {
  return lineText(`give the ${what}'s name as text`)
    .overwrite((text) => text.trim().replace(/\s+/g, " "))
    .min(1, `give the ${what} a name`)
    .max(max, `a ${what} name is at most ${max} characters`)
    .regex(/[\p{L}\p{N}]/u, `a ${what} name needs at least one letter or digit`)
    .refine((text) => !/\p{Cs}/u.test(text), `the ${what} name holds a broken character; type it again`);
}

export const brandNameSchema = nameSchema("brand", BRAND_NAME_MAX).describe(`1–${BRAND_NAME_MAX} characters; unique in the shop, whatever the letter case.`);
export const lineNameSchema = nameSchema("line", LINE_NAME_MAX).describe(`1–${LINE_NAME_MAX} characters; unique within its brand, whatever the letter case.`);

/** An id in a path: digits only ("07", "1e3" and "0x1" are no ids), within PostgreSQL's integer. */
const idSchema = z
  .string()
  .regex(/^[1-9]\d{0,9}$/)
  .transform(Number)
  .pipe(z.number().int().max(2_147_483_647));

/** `{id}` in /api/v1/brands/{id} and /api/v1/brands/{id}/lines. */
export const brandParamsSchema = z.object({ id: idSchema.describe("The brand's id.") });
/** `{id}` in /api/v1/lines/{id}. */
export const lineParamsSchema = z.object({ id: idSchema.describe("The line's id.") });

/** POST /api/v1/brands. */
export const newBrandSchema = z.object({ name: brandNameSchema }).strict();
/** PATCH /api/v1/brands/{id}: a brand's only field is its name. */
export const brandChangesSchema = z.object({ name: brandNameSchema }).strict();

const lineFields = {
  name: lineNameSchema,
  season: z.enum(SEASONS, { error: `choose one of ${SEASONS.join(", ")}` }),
  terrain: z.enum(TERRAINS, { error: `choose one of ${TERRAINS.join(", ")}` }),
  threePeak: z.boolean({ error: "say true or false" }).describe("Marked with the three-peak mountain snowflake (3PMSF)."),
};

/** POST /api/v1/brands/{id}/lines; the tread depth may be left out while it is unknown. */
export const newLineSchema = z.object({ ...lineFields, treadDepth32: treadDepth32Schema.nullish() }).strict();

/** PATCH /api/v1/lines/{id}: any of a line's fields; `retired` takes it out of (or back into) use for new items. */
export const lineChangesSchema = z
  .object({
    ...lineFields,
    treadDepth32: treadDepth32Schema.nullable(),
    retired: z.boolean({ error: "say true or false" }).describe("A retired line keeps its items but takes no new ones; false un-retires it."),
  })
  .partial()
  .strict()
  .refine((changes) => Object.keys(changes).length > 0, { message: "name at least one field to change" });

export type BrandNameBody = z.infer<typeof newBrandSchema>;
export type NewLineBody = z.infer<typeof newLineSchema>;
export type LineChanges = z.infer<typeof lineChangesSchema>;

/** A brand as the API answers a write. */
export const brandSchema = z.object({ id: z.number().int(), name: z.string() });

/** A line as the API answers a write. */
export const lineSchema = z.object({
  id: z.number().int(),
  brandId: z.number().int(),
  name: z.string(),
  season: z.enum(SEASONS),
  terrain: z.enum(TERRAINS),
  threePeak: z.boolean(),
  treadDepth32: z.number().int().nullable().describe("New tread depth in 32nds of an inch; null while unknown."),
  retired: z.boolean().describe("A retired line keeps its items (still listed and sold) but takes no new ones."),
});

/** GET /api/v1/brands: every brand with its lines, each in name order. */
export const brandListSchema = z.object({
  brands: z.array(brandSchema.extend({ lines: z.array(lineSchema.omit({ brandId: true })) })),
});

export type BrandAnswer = z.infer<typeof brandSchema>;
export type LineAnswer = z.infer<typeof lineSchema>;
export type BrandList = z.infer<typeof brandListSchema>;
export type ListedBrand = BrandList["brands"][number];
export type ListedLine = ListedBrand["lines"][number];
