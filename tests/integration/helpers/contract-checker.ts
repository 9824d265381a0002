import Ajv2020, { type ErrorObject, type ValidateFunction } from "ajv/dist/2020.js";
import addFormats from "ajv-formats";

/**
 * Checks API answers against an OpenAPI 3.1 document: the path and method must be described, the
 * status listed, the content type declared, and a JSON body must match the schema for that status.
 * It reads the document as plain JSON, so it serves the tests that import it and the walk over HTTP
 * that fetches it alike.
 */

type OperationObject = { responses: Record<string, { content?: Record<string, unknown> }> };
type PathItem = Record<string, OperationObject>;
export type DescribedApi = { paths: Record<string, unknown> };

const DOCUMENT_ID = "https://sidewise.test/api/v1/openapi.json";

/** A JSON Pointer (RFC 6901) into the document, written as a URI fragment. */
export const pointerTo = (...tokens: string[]) => tokens.map((token) => `/${encodeURIComponent(token.replace(/~/g, "~0").replace(/\//g, "~1"))}`).join("");

const listErrors = (errors: ErrorObject[] | null | undefined) =>
  (errors ?? []).map((error) => `  ${error.instancePath || "(body)"} ${error.message ?? ""} ${JSON.stringify(error.params)}`).join("\n");

export function contractChecker(document: DescribedApi) {
  // OpenAPI 3.1 schemas are JSON Schema 2020-12. The document itself is added as one schema so that
  // references resolve inside it: its top-level fields and the keywords OpenAPI's base vocabulary
  // adds are declared as annotations, and "binary" is OpenAPI's format for a file in a form. A record
  // keyed by an enum (counts per status) comes out as `propertyNames` with `required`, which
  // strictRequired would take for a typo.
  const ajv = new Ajv2020({ allErrors: true, strict: true, strictRequired: false, allowUnionTypes: true });
  addFormats(ajv);
  ajv.addFormat("binary", true);
  ajv.addVocabulary(["openapi", "info", "jsonSchemaDialect", "servers", "paths", "webhooks", "components", "security", "tags", "externalDocs", "discriminator", "xml", "example"]);
  ajv.addSchema(document, DOCUMENT_ID);

  const validators = new Map<string, ValidateFunction>();
  /** The validator of the schema at a place in the document; its references resolve inside the document. */
  function validatorAt(pointer: string): ValidateFunction {
    let validate = validators.get(pointer);
    if (!validate) validators.set(pointer, (validate = ajv.compile({ $ref: `${DOCUMENT_ID}#${pointer}` })));
    return validate;
  }

  const templates = Object.keys(document.paths).map((template) => ({
    template,
    pattern: new RegExp(`^${template.replace(/[.*+?^$()|[\]\\]/g, "\\$&").replace(/\{\w+\}/g, "[^/]+")}$`),
    literals: template.split("/").filter((segment) => !segment.startsWith("{")).length,
  }));
  /** The described path an address falls under; a literal segment wins over a parameter (/catalog/export over /catalog/{sku}). */
  const describedPath = (pathname: string) =>
    templates.filter(({ pattern }) => pattern.test(pathname)).sort((a, b) => b.literals - a.literals)[0]?.template;

  /** Checks one answer and hands it back unread; throws, saying what differs, when the document does not describe it. */
  async function checkContract(request: Request, response: Response): Promise<Response> {
    const url = new URL(request.url);
    // The sign-in service's own endpoints are better-auth's, described by it rather than here.
    if (url.pathname.startsWith("/api/auth/")) return response;
    const method = request.method.toLowerCase();
    const label = `${request.method} ${url.pathname}${url.search.slice(0, 200)} → ${response.status}`;
    const path = describedPath(url.pathname);
    const operation = path === undefined ? undefined : (document.paths[path] as PathItem | undefined)?.[method];
    if (!path || !operation) throw new Error(`${label}: the API description has no ${request.method} ${path ?? url.pathname}`);
    const declared = operation.responses[String(response.status)];
    if (!declared) throw new Error(`${label}: the API description lists only ${Object.keys(operation.responses).join(", ")} for ${request.method} ${path}`);

    // A status without content (204) carries no body at all (Fetch Standard: a null body status).
    if (!declared.content) return response;
    const mediaType = response.headers.get("content-type")?.split(";")[0]?.trim().toLowerCase() ?? "";
    if (!(mediaType in declared.content)) {
      throw new Error(`${label}: answered ${mediaType || "no content type"}, the API description says ${Object.keys(declared.content).join(" or ")}`);
    }
    if (mediaType === "application/json") {
      const body = await response.clone().text();
      const validate = validatorAt(pointerTo("paths", path, method, "responses", String(response.status), "content", mediaType, "schema"));
      if (!validate(JSON.parse(body))) throw new Error(`${label} does not match the API description:\n${listErrors(validate.errors)}\nbody: ${body.slice(0, 600)}`);
    }
    return response;
  }

  return { checkContract, validatorAt };
}
