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

export interface ParameterObject {
  name: string;
  in: "path" | "query" | "header";
  required: boolean;
  description?: string;
  schema: JsonSchema;
}

/** The parameters an object schema reads from the path, the query string or the headers, one per property. */
export function parametersOf(schema: z.ZodType, location: ParameterObject["in"]): ParameterObject[] {
  const json = z.toJSONSchema(schema, { io: "input" }) as JsonSchema & { properties?: Record<string, JsonSchema>; required?: string[] };
  if (json.type !== "object") throw new Error(`${location} parameters must be described by an object schema`);
  return Object.entries(json.properties ?? {}).map(([name, { description, ...property }]) => ({
    name,
    in: location,
    required: location === "path" || (json.required ?? []).includes(name),
    ...(typeof description === "string" ? { description } : {}),
    schema: property,
  }));
}
