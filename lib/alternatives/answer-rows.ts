import { z } from "zod";
import { tireSchema } from "@/lib/catalog/catalog-tire";
import { CONSTRUCTIONS, SERVICE_TYPES } from "@/lib/tire";
import { CANDIDATE_ROW_FIELDS } from "./fitment-picks";

/** A stock item as the finder's statement returns it: a Tire's columns, what the rules read, its place in the order. */
const candidateRowSchema = tireSchema.omit({ inStock: true }).extend({
  rimDiameterIn: z.number(),
  construction: z.enum(CONSTRUCTIONS),
  serviceType: z.enum(SERVICE_TYPES),
  diffPct: z.number(),
  sortKey: z.number(),
}).strict();

/**
 * What the finder's one statement answers, its rows named (namedAnswer): a page of results, their
 * total, the near misses. The tests check it against this schema; the request path reads it as this
 * type unchecked.
 */
export const finderAnswerSchema = z.strictObject({
  results: z.array(candidateRowSchema),
  total: z.number().int(),
  nearMisses: z.array(candidateRowSchema),
});

export type FinderAnswer = z.infer<typeof finderAnswerSchema>;

type CandidateRow = FinderAnswer["results"][number];

/** The finder statement's JSON as it comes: each row an array of values in the order of CANDIDATE_ROW_FIELDS. */
export interface FinderStatementAnswer {
  results: unknown[][];
  total: number;
  nearMisses: unknown[][];
}

function namedRow(values: readonly unknown[]): CandidateRow {
  const row: Record<string, unknown> = {};
  for (let i = 0; i < CANDIDATE_ROW_FIELDS.length; i++) row[CANDIDATE_ROW_FIELDS[i]!] = values[i];
  return row as CandidateRow;
}

/** The statement's answer with each row's values under their names. */
export function namedAnswer({ results, total, nearMisses }: FinderStatementAnswer): FinderAnswer {
  return { results: results.map(namedRow), total, nearMisses: nearMisses.map(namedRow) };
}
