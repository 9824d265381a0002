import { z } from "zod";
import type { NamedSchema } from "./operation";

export type JsonSchema = { [keyword: string]: unknown };

export const componentRef = (name: string) => ({ $ref: `#/components/schemas/${name}` });

/**
 * The JSON Schema (2020-12) of each named body, converted together so that one body naming
 * another (a catalog page's Tire) refers to it instead of repeating it. Requests are described as
 * clients send them (`io: "input"`: defaults optional, text before it is parsed), answers as
 * the server writes them.
 */
export function componentSchemas(bodies: readonly NamedSchema[], io: "input" | "output"): Record<string, JsonSchema> {
  const registry = z.registry<{ id: string }>();
  const names = new Map<string, z.ZodType>();
  for (const { name, schema } of bodies) {
    const taken = registry.get(schema)?.id;
    if (taken !== undefined && taken !== name) throw new Error(`one schema goes by two names: ${taken} and ${name}`);
    if ((names.get(name) ?? schema) !== schema) throw new Error(`two schemas go by the name ${name}`);
    names.set(name, schema);
    registry.add(schema, { id: name });
  }
  const { schemas } = z.toJSONSchema(registry, { io, uri: (id) => componentRef(id).$ref }) as { schemas: Record<string, JsonSchema> };
  // Each body comes out as a document of its own; inside the OpenAPI document it needs neither a dialect nor an id.
  for (const schema of Object.values(schemas)) {
    delete schema.$schema;
    delete schema.$id;
  }
  return schemas;
}

/** One schema on its own (a header's, a parameter's), without the dialect a document of its own would name. */
export function jsonSchemaOf(schema: z.ZodType, io: "input" | "output", unrepresentable: "throw" | "any" = "throw"): JsonSchema {
  const json = z.toJSONSchema(schema, { io, unrepresentable }) as JsonSchema;
  delete json.$schema;
  return json;
}

export interface ParameterObject {
  name: string;
  in: "path" | "query" | "header";
  required: boolean;
  description?: string;
  schema: JsonSchema;
}

type ObjectSchema = JsonSchema & { properties?: Record<string, JsonSchema>; required?: string[] };

/**
 * The parameters an object schema reads from the path, the query string or the headers, one per
 * property. Each is described by the value it is read as where zod can say so (`limit`: a number
 * from 1 to 500, rather than text of digits), else by the text it must be; which ones are required
 * follows what a client sends.
 */
export function parametersOf(schema: z.ZodType, location: ParameterObject["in"]): ParameterObject[] {
  const sent = jsonSchemaOf(schema, "input") as ObjectSchema;
  const read = jsonSchemaOf(schema, "output", "any") as ObjectSchema;
  if (sent.type !== "object") throw new Error(`${location} parameters must be described by an object schema`);
  return Object.entries(sent.properties ?? {}).map(([name, asSent]) => {
    const asRead = read.properties?.[name];
    const { description, ...property } = asRead && Object.keys(asRead).length > 0 ? asRead : asSent;
    return {
      name,
      in: location,
      required: location === "path" || (sent.required ?? []).includes(name),
      ...(typeof description === "string" ? { description } : {}),
      schema: property,
    };
  });
}
