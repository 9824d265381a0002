import { buildOpenApiDocument, type OpenApiDocument } from "./document";
import type { ApiOperation } from "./operation";
import { BRAND_ROUTES } from "./routes-brands";
import { CARD_ROUTES } from "./routes-cards";
import { CATALOG_ROUTES } from "./routes-catalog";
import { OFFER_ROUTES } from "./routes-offers";
import { PUBLIC_ROUTES } from "./routes-public";
import { QUOTE_ROUTES } from "./routes-quotes";
import { SHOP_ROUTES } from "./routes-shop";

/** Every route of the API: a new route file needs its entry here (the document's test lists the files). */
export const API_OPERATIONS: readonly ApiOperation[] = [...PUBLIC_ROUTES, ...CATALOG_ROUTES, ...BRAND_ROUTES, ...CARD_ROUTES, ...QUOTE_ROUTES, ...OFFER_ROUTES, ...SHOP_ROUTES];

let built: OpenApiDocument | undefined;

/** The app's OpenAPI document, built once: it depends on no request. */
export function openApiDocument(): OpenApiDocument {
  return (built ??= buildOpenApiDocument(API_OPERATIONS));
}
