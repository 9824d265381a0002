import type { z } from "zod";

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

/**
 * The schema of a body whose code cannot use a type inferred from zod (the pure tire core imports no
 * package; some builders belong to other folders): it compiles only while the schema's output type
 * and `Body` are the same type, so the description cannot drift from the code.
 */
export const schemaOf =
  <Body>() =>
  <Schema extends z.ZodType>(schema: Schema & (Same<z.output<Schema>, Body> extends true ? unknown : { mismatch: Body })): Schema =>
    schema;
