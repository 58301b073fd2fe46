import { z } from "zod";

export const signInSchema = z.object({
  email: z.email("Enter the e-mail address of your staff account.").max(254),
  password: z.string().min(1, "Enter your password.").max(200),
});

export type SignInInput = z.infer<typeof signInSchema>;
