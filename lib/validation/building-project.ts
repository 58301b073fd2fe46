import { z } from "zod";
import { PROJECT_STATUSES } from "@/db/types";

export const projectStatusSchema = z.object({
  status: z.enum(PROJECT_STATUSES, "Choose planned, under way or finished."),
  statusDate: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, "Enter the date as YYYY-MM-DD.")
    .refine((v) => !Number.isNaN(Date.parse(`${v}T00:00:00Z`)) && new Date(`${v}T00:00:00Z`).toISOString().startsWith(v), "Enter a real calendar date."),
});

export type ProjectStatusInput = z.infer<typeof projectStatusSchema>;
