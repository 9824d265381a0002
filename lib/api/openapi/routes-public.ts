import { z } from "zod";
import { alternativesSchema } from "@/lib/alternatives/find-alternatives";
import { alternativesQuerySchema } from "@/lib/alternatives/query-schema";
import { compareAnswerSchema, compareQuerySchema } from "@/lib/compare/compare-api";
import { decodeAnswerSchema, decodeQuerySchema } from "@/lib/decode/decode-api";
import { healthyBodySchema, unhealthyBodySchema } from "@/lib/health/check-database";
import { plusBodySchema, plusQuerySchema } from "@/lib/plus/plus-request";
import { wearMatchAnswerSchema, wearMatchQuerySchema } from "@/lib/wear-match/wear-match-api";
import { named, type ApiOperation } from "./operation";

/** The 200 body of GET /api/v1/openapi.json, as far as a client relies on it. */
export const openApiDocumentSchema = z.looseObject({
  openapi: z.string(),
  info: z.looseObject({ title: z.string(), version: z.string() }),
  paths: z.record(z.string(), z.looseObject({})),
});

const READING_ERRORS = ["unreadable", "unknown_load_index", "unknown_speed_symbol"] as const;

/** Routes anyone may call that read sizes, the finder and the service itself. */
export const PUBLIC_ROUTES: ApiOperation[] = [
  {
    method: "get",
    path: "/api/health",
    tag: "Service",
    summary: "Whether the app can reach its database",
    access: "public",
    answers: [
      { status: 200, description: "A real query succeeded.", json: named("Healthy", healthyBodySchema) },
      { status: 503, description: "The database could not be reached.", json: named("Unhealthy", unhealthyBodySchema) },
    ],
  },
  {
    method: "get",
    path: "/api/v1/openapi.json",
    tag: "Service",
    summary: "This document",
    access: "public",
    answers: [{ status: 200, description: "The OpenAPI 3.1 description of every route.", json: named("OpenApiDocument", openApiDocumentSchema) }],
  },
  {
    method: "get",
    path: "/api/v1/decode",
    tag: "Sizes",
    summary: "Read anything typed from a sidewall",
    description:
      "A size, a service description, XL, a load range, a ply rating, a DOT code, UTQG grades, winter marks, in any case and spacing. " +
      "Geometry is nominal (new, unloaded). 422 only when nothing in the text is readable, or a load index or speed symbol lies outside the published tables.",
    access: "public",
    query: decodeQuerySchema,
    answers: [{ status: 200, description: "What the text says.", json: named("Decoded", decodeAnswerSchema) }],
    errors: [...READING_ERRORS],
  },
  {
    method: "get",
    path: "/api/v1/compare",
    tag: "Sizes",
    summary: "Two to four sizes measured against the first",
    access: "public",
    query: compareQuerySchema,
    answers: [{ status: 200, description: "Each size with its differences and the speedometer.", json: named("Comparison", compareAnswerSchema) }],
    errors: ["unreadable"],
  },
  {
    method: "get",
    path: "/api/v1/plus",
    tag: "Sizes",
    summary: "Plus planner: grid sizes within tolerance on wheels one inch smaller to three larger",
    description:
      "Widths 125–355 step 10, aspect ratios 25–85 step 5, rims −1 to +3 inches, within the tolerance (default the shop's). By default only the widths a " +
      "wheel of that diameter takes in practice (the original's −10 mm, −20 mm on a smaller wheel, to +20 mm plus 10 mm per inch added); all=true lists every one.",
    access: "public",
    query: plusQuerySchema,
    answers: [{ status: 200, description: "Every candidate size with its catalog matches.", json: named("PlusPlan", plusBodySchema) }],
    errors: [...READING_ERRORS],
  },
  {
    method: "get",
    path: "/api/v1/alternatives",
    tag: "Finder",
    summary: "Replacement finder: equal-or-better tires from stock",
    description:
      "Rules 1–7 of equal-or-better against the original. Sorted by |diameterDiffPct| (or price, or load margin), ties by price, then SKU in plain character order. " +
      "A dual index (loadIndexDual, or the Placard check's minLoadIndexDual) admits only tires with a dual index at least that high.",
    access: "public",
    query: alternativesQuerySchema,
    answers: [{ status: 200, description: "One page of results, their total and the near misses.", json: named("Alternatives", alternativesSchema) }],
    errors: [...READING_ERRORS],
  },
  {
    method: "get",
    path: "/api/v1/wear-match",
    tag: "Sizes",
    summary: "Wear match: can one or two new tires join worn ones on an all-wheel-drive vehicle",
    description:
      "Every tire must lie within the limit of every other. With a tread-depth limit (limit32) or a rolling-circumference limit (limitCircumferenceMm), " +
      "or neither for the shop's default, but not both (400). The new tire's diameter is the size's nominal one (common practice); the staying tires are " +
      "taken to have started at the new tire's depth. replaceSet when the staying tires already differ by more than the limit or the new tire is too " +
      "shallow; else fitsAsIs, or shaveTo32 (unrounded). Depths in 32nds of an inch, halves allowed.",
    access: "public",
    query: wearMatchQuerySchema,
    answers: [{ status: 200, description: "The verdict and each tire's figures.", json: named("WearMatch", wearMatchAnswerSchema) }],
    errors: ["unreadable"],
  },
];
