import { z } from "zod";
import { ROLES } from "@/db/types";

/** NIST SP 800-63B asks for at least 8; staff accounts guard families' personal data, so 12. */
export const PASSWORD_MIN_LENGTH = 12;

const roleSchema = z.enum(ROLES, "Choose a role: communications, facilities or admin.");

export const newStaffAccountSchema = z.object({
  name: z.string().trim().min(2, "Enter the person's name.").max(120, "Keep the name under 120 characters."),
  email: z
    .email("Enter a valid e-mail address, like name@example.org.")
    .max(254)
    .transform((v) => v.trim().toLowerCase()),
  role: roleSchema,
  password: z
    .string()
    .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters for the first password.`)
    .max(200, "Keep the password under 200 characters."),
});

export const staffAccountUpdateSchema = z
  .object({
    role: roleSchema.optional(),
    disabled: z.boolean().optional(),
  })
  .refine((v) => v.role !== undefined || v.disabled !== undefined, "Say what to change: role or disabled.");

export const staffIdSchema = z.coerce.number().int().positive();

export type NewStaffAccountInput = z.input<typeof newStaffAccountSchema>;
export type NewStaffAccount = z.output<typeof newStaffAccountSchema>;
export type StaffAccountUpdate = z.output<typeof staffAccountUpdateSchema>;
