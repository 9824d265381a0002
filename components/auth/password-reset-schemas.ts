import { z } from "zod";
import { signUpSchema } from "@/lib/auth/form-schemas";

export const forgotPasswordSchema = z.object({ email: signUpSchema.shape.email });

export const resetPasswordSchema = z
  .object({ newPassword: signUpSchema.shape.password, confirmPassword: z.string().min(1, "Type the new password again.") })
  .refine((values) => values.newPassword === values.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords differ. Type the same new password in both fields.",
  });

/** What a reset link carries: the sign-in service's token, letters and digits only. */
export const resetTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{8,200}$/);
