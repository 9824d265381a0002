import { z } from "zod";

const serverEnvSchema = z.object({
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, "DATABASE_URL must start with postgres:// or postgresql://")
    .optional(),
  PGLITE_DATA_DIR: z.string().min(1).default(".data/pglite"),
  DEMO_SEED: z.enum(["on", "off"]).default("on"),
});

export type ServerEnv = z.infer<typeof serverEnvSchema>;

/** Reads and validates the server's environment; a bad value fails loudly with the variable's name. */
export function readServerEnv(source: NodeJS.ProcessEnv = process.env): ServerEnv {
  const parsed = serverEnvSchema.safeParse({
    DATABASE_URL: source.DATABASE_URL || undefined,
    PGLITE_DATA_DIR: source.PGLITE_DATA_DIR || undefined,
    DEMO_SEED: source.DEMO_SEED || undefined,
  });
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`);
    throw new Error(`Invalid environment: ${problems.join("; ")}`);
  }
  return parsed.data;
}
