import { z } from "zod";
import { newPasswordSchema, PASSWORD_MAX_LENGTH, personNameSchema } from "./auth";

/** Account settings of the signed-in person. Imports only zod. */

export const updateAccountBodySchema = z.object({ name: personNameSchema });
export type UpdateAccountBody = z.infer<typeof updateAccountBodySchema>;

export const changePasswordBodySchema = z
  .object({
    currentPassword: z
      .string({ error: "Enter your current password." })
      .min(1, "Enter your current password.")
      .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`),
    newPassword: newPasswordSchema,
  })
  .refine((body) => body.newPassword !== body.currentPassword, {
    path: ["newPassword"],
    message: "Choose a password different from the current one.",
  });
export type ChangePasswordBody = z.infer<typeof changePasswordBodySchema>;
