import {
  brandChangesSchema,
  brandListSchema,
  brandParamsSchema,
  brandSchema,
  lineChangesSchema,
  lineParamsSchema,
  lineSchema,
  newBrandSchema,
  newLineSchema,
} from "@/lib/brands/brand-bodies";
import { named, type ApiOperation } from "./operation";

const brandAnswer = named("Brand", brandSchema);
const lineAnswer = named("Line", lineSchema);

/** Brands and their tread lines: read by anyone, written by staff. */
export const BRAND_ROUTES: ApiOperation[] = [
  {
    method: "get",
    path: "/api/v1/brands",
    tag: "Brands and lines",
    summary: "Every brand with its lines, retired ones included, in name order",
    access: "public",
    answers: [{ status: 200, description: "The brands.", json: named("BrandList", brandListSchema) }],
  },
  {
    method: "post",
    path: "/api/v1/brands",
    tag: "Brands and lines",
    summary: "Add a brand",
    description: "The name is trimmed; one already used, compared without letter case → 409 already_exists.",
    access: "staff",
    body: named("NewBrand", newBrandSchema),
    answers: [{ status: 201, description: "The new brand.", json: brandAnswer }],
    errors: ["already_exists"],
  },
  {
    method: "patch",
    path: "/api/v1/brands/{id}",
    tag: "Brands and lines",
    summary: "Rename a brand",
    description: "Its lines and items follow. A name another brand has, compared without letter case → 409 already_exists.",
    access: "staff",
    params: brandParamsSchema,
    body: named("BrandChanges", brandChangesSchema),
    answers: [{ status: 200, description: "The brand as renamed.", json: brandAnswer }],
    errors: ["already_exists"],
  },
  {
    method: "post",
    path: "/api/v1/brands/{id}/lines",
    tag: "Brands and lines",
    summary: "Add a tread line to a brand",
    description: "A name the brand already has, compared without letter case → 409 already_exists.",
    access: "staff",
    params: brandParamsSchema,
    body: named("NewLine", newLineSchema),
    answers: [{ status: 201, description: "The new line.", json: lineAnswer }],
    errors: ["already_exists"],
  },
  {
    method: "patch",
    path: "/api/v1/lines/{id}",
    tag: "Brands and lines",
    summary: "Change a line, or retire or un-retire it",
    description:
      "A retired line keeps its items, which stay listed, sold and offered by the finder, but takes no new items (422 line_retired where an item is added). " +
      "A name its brand already has, compared without letter case → 409 already_exists.",
    access: "staff",
    params: lineParamsSchema,
    body: named("LineChanges", lineChangesSchema),
    answers: [{ status: 200, description: "The line after the change.", json: lineAnswer }],
    errors: ["already_exists"],
  },
];
