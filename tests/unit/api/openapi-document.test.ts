import { describe, expect, it } from "vitest";
import { z } from "zod";
import { buildOpenApiDocument } from "@/lib/api/openapi/document";
import { errorCodesOf, named, type ApiOperation } from "@/lib/api/openapi/operation";

const part = z.object({ name: z.string() });
const page = z.object({ parts: z.array(part), next: z.string().nullable() });

const listParts: ApiOperation = {
  method: "get",
  path: "/api/v1/parts",
  tag: "Parts",
  summary: "Parts, a page at a time",
  access: "public",
  query: z.object({ limit: z.string().regex(/^\d+$/).transform(Number).pipe(z.number().min(1).max(500)).optional(), q: z.string().describe("Words to look for.") }),
  answers: [{ status: 200, description: "A page.", json: named("PartPage", page) }],
};
const renamePart: ApiOperation = {
  method: "patch",
  path: "/api/v1/parts/{id}",
  tag: "Parts",
  summary: "Rename a part",
  access: "staff",
  params: z.object({ id: z.string().regex(/^\d+$/) }),
  body: named("PartChanges", z.object({ name: z.string().min(1) }).strict()),
  answers: [{ status: 200, description: "The part.", json: named("Part", part) }],
  errors: ["already_exists"],
};

describe("the codes an operation answers with", () => {
  it("are those its guard, its validation and the path check give, then its own", () => {
    expect(errorCodesOf(listParts).sort()).toEqual(["invalid_parameter", "missing_parameter", "too_long"]);
    expect(errorCodesOf(renamePart).sort()).toEqual(
      ["already_exists", "forbidden", "invalid_parameter", "missing_parameter", "not_found", "too_large", "unauthenticated", "unsupported_media_type"].sort(),
    );
    expect(errorCodesOf({ ...listParts, query: undefined })).toEqual([]);
  });
});

describe("an OpenAPI document built from zod schemas (OpenAPI Specification 3.1.1)", () => {
  const document = buildOpenApiDocument([listParts, renamePart]);

  it("names each body once under components and refers to it, also from inside another body", () => {
    expect(document.openapi).toBe("3.1.1");
    expect(document.components.schemas.PartPage).toMatchObject({ properties: { parts: { type: "array", items: { $ref: "#/components/schemas/Part" } } } });
    expect(document.components.schemas.Part).toEqual({ type: "object", properties: { name: { type: "string" } }, required: ["name"], additionalProperties: false });
    expect(document.components.schemas.PartChanges).toMatchObject({ required: ["name"], additionalProperties: false });
    expect(document.paths["/api/v1/parts/{id}"]?.patch).toMatchObject({
      security: [{ session: [] }],
      requestBody: { required: true, content: { "application/json": { schema: { $ref: "#/components/schemas/PartChanges" } } } },
      responses: { "200": { content: { "application/json": { schema: { $ref: "#/components/schemas/Part" } } } } },
    });
  });

  it("describes parameters by what is read where zod can say so, and says which are required", () => {
    expect(document.paths["/api/v1/parts"]?.get).toMatchObject({
      parameters: [
        { name: "limit", in: "query", required: false, schema: { type: "number", minimum: 1, maximum: 500 } },
        { name: "q", in: "query", required: true, description: "Words to look for.", schema: { type: "string" } },
      ],
    });
    expect(document.paths["/api/v1/parts"]?.get).not.toHaveProperty("security");
  });

  it("gives each error status the shared error shape narrowed to the codes it stands for", () => {
    const responses = (document.paths["/api/v1/parts/{id}"]?.patch as { responses: Record<string, unknown> }).responses;
    expect(Object.keys(responses)).toEqual(["200", "400", "401", "403", "404", "409", "413", "415"]);
    expect(responses["400"]).toMatchObject({
      description: "`invalid_parameter`, `missing_parameter`",
      content: { "application/json": { schema: { allOf: [{ $ref: "#/components/schemas/Error" }, { properties: { error: { properties: { code: { enum: ["invalid_parameter", "missing_parameter"] } } } } }] } } },
    });
  });

  it("refuses two schemas under one name, and one operation described twice", () => {
    const otherPart = { ...renamePart, method: "get" as const, answers: [{ status: 200, description: "x", json: named("Part", z.object({ id: z.number() })) }] };
    expect(() => buildOpenApiDocument([renamePart, otherPart])).toThrow(/two schemas go by the name Part/);
    expect(() => buildOpenApiDocument([listParts, listParts])).toThrow(/GET \/api\/v1\/parts is described twice/);
  });
});
