import { readdirSync } from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/v1/openapi.json/route";
import { apiDocument, checkContract, pointerTo, validatorAt } from "../helpers/contract";

// OpenAPI Specification 3.1.1: an OpenAPI object has `openapi`, `info` (title, version) and here
// `paths`; every Operation has `responses`, every Response a `description`; schemas are JSON Schema 2020-12.

type Json = { [key: string]: unknown };
const METHODS = ["get", "put", "post", "delete", "options", "head", "patch", "trace"];
const apiFolder = path.join(process.cwd(), "app", "api");
// The sign-in service's endpoints belong to better-auth, which describes them itself.
const UNDESCRIBED = ["auth/[...all]/route.ts"];

const operations = Object.entries(apiDocument.paths).flatMap(([template, item]) =>
  Object.entries(item as Json).map(([method, operation]) => ({ template, method, operation: operation as Json })),
);

/** Every `$ref` in the document, with where it stands. */
function refs(value: unknown, at = ""): { at: string; ref: string }[] {
  if (Array.isArray(value)) return value.flatMap((item, index) => refs(item, `${at}/${index}`));
  if (typeof value !== "object" || value === null) return [];
  return Object.entries(value).flatMap(([key, item]) => (key === "$ref" && typeof item === "string" ? [{ at, ref: item }] : refs(item, `${at}/${key}`)));
}

function resolves(pointer: string): boolean {
  let node: unknown = apiDocument;
  for (const token of pointer.split("/").slice(1).map((part) => decodeURIComponent(part).replace(/~1/g, "/").replace(/~0/g, "~"))) {
    if (typeof node !== "object" || node === null || !(token in node)) return false;
    node = (node as Json)[token];
  }
  return true;
}

/** "/api/v1/catalog/{sku}" is served by app/api/v1/catalog/[sku]/route.ts. */
const routeFileOf = (template: string) => `${template.replace(/^\/api\//, "").replace(/\{(\w+)\}/g, "[$1]")}/route.ts`;

describe("the OpenAPI document", () => {
  it("is an OpenAPI 3.1 document whose every operation has responses with descriptions", () => {
    expect(apiDocument.openapi).toMatch(/^3\.1\.\d+$/);
    expect(apiDocument.info).toMatchObject({ title: expect.any(String), version: expect.any(String) });
    expect(operations.length).toBeGreaterThan(0);
    for (const { template, method, operation } of operations) {
      expect(METHODS, `${method} ${template}`).toContain(method);
      const responses = Object.entries(operation.responses as Json);
      expect(responses.length, `${method} ${template}`).toBeGreaterThan(0);
      for (const [status, response] of responses) {
        expect(status, `${method} ${template}`).toMatch(/^[1-5]\d\d$/);
        expect((response as Json).description, `${method} ${template} ${status}`).toEqual(expect.any(String));
      }
    }
  });

  it("has no reference that leads nowhere", () => {
    const found = refs(apiDocument);
    expect(found.length).toBeGreaterThan(0);
    expect(found.filter(({ ref }) => !ref.startsWith("#/") || !resolves(ref.slice(1)))).toEqual([]);
  });

  it("holds only schemas a JSON Schema 2020-12 validator compiles in strict mode", () => {
    for (const name of Object.keys(apiDocument.components.schemas)) validatorAt(pointerTo("components", "schemas", name));
    for (const { template, method, operation } of operations) {
      for (const [index] of ((operation.parameters ?? []) as Json[]).entries()) validatorAt(pointerTo("paths", template, method, "parameters", String(index), "schema"));
      for (const [status, response] of Object.entries(operation.responses as Json)) {
        for (const mediaType of Object.keys(((response as Json).content ?? {}) as Json)) {
          validatorAt(pointerTo("paths", template, method, "responses", status, "content", mediaType, "schema"));
        }
      }
    }
  });

  it("describes every handler of every route file under app/api, and nothing else", async () => {
    const routeFiles = (readdirSync(apiFolder, { recursive: true }) as string[])
      .map((file) => file.split(path.sep).join("/"))
      .filter((file) => /(^|\/)route\.ts$/.test(file) && !UNDESCRIBED.includes(file));
    const handlers: string[] = [];
    for (const file of routeFiles) {
      const routeModule = (await import(/* @vite-ignore */ path.join(apiFolder, file))) as Json;
      handlers.push(...METHODS.filter((method) => typeof routeModule[method.toUpperCase()] === "function").map((method) => `${file}#${method}`));
    }
    const described = operations.map(({ template, method }) => `${routeFileOf(template)}#${method}`);
    expect(handlers.filter((handler) => !described.includes(handler))).toEqual([]);
    expect(described.filter((operation) => !handlers.includes(operation))).toEqual([]);
  });

  it("is served at GET /api/v1/openapi.json", async () => {
    const request = new NextRequest("http://localhost:3000/api/v1/openapi.json");
    const response = await checkContract(request, GET());
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual(JSON.parse(JSON.stringify(apiDocument)));
  });

  it("turns an answer that differs from it into a failure saying where", async () => {
    const decode = new NextRequest("http://localhost:3000/api/v1/decode?q=205%2F55R16");
    const wrong = await checkContract(decode, Response.json({ input: 205, size: null })).catch((error: Error) => error.message);
    expect(wrong).toMatch(/^GET \/api\/v1\/decode\?q=205%2F55R16 → 200 does not match the API description:\n/);
    expect(wrong).toContain("/input must be string");
    expect(wrong).toContain("(body) must have required property 'service'");
    await expect(checkContract(decode, Response.json({ error: { code: "not_found", message: "x" } }, { status: 404 }))).rejects.toThrow(/lists only 200, 400, 414, 422 for GET/);
    await expect(checkContract(decode, Response.json({ error: { code: "gone", message: "x" } }, { status: 422 }))).rejects.toThrow(/\/error\/code must be equal to one of the allowed values/);
    await expect(checkContract(decode, new Response("a,b", { headers: { "content-type": "text/csv" } }))).rejects.toThrow(/answered text\/csv, the API description says application\/json/);
    await expect(checkContract(new NextRequest("http://localhost:3000/api/v1/nowhere"), Response.json({}))).rejects.toThrow(/has no GET \/api\/v1\/nowhere/);
    await expect(checkContract(new NextRequest("http://localhost:3000/api/v1/catalog/X", { method: "PUT" }), Response.json({}))).rejects.toThrow(/has no PUT \/api\/v1\/catalog\/\{sku\}/);
  });
});
