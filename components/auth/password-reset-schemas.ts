import { z } from "zod";

/** What a reset link carries: the sign-in service's token, letters and digits only. */
export const resetTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{8,200}$/);
