"use server";

import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { db } from "@/db/client";
import {
  deliverConfirmationSoon,
  publicSubmitOptions,
  rateLimitMessage,
  STORE_FAILED_MESSAGE,
} from "@/lib/questions/public-intake";
import { submitQuestion, type SubmitResult } from "@/lib/questions/submit";
import { fieldErrors } from "@/lib/validation/field-errors";
import { askFormFromFormData, askFormSchema } from "@/lib/validation/question";

export interface AskFormState {
  status: "idle" | "invalid" | "limited" | "failed";
  message?: string;
  errors?: Record<string, string>;
  /** What the asker typed, so a page rendered without JavaScript keeps it. */
  values?: Record<string, string | boolean | undefined>;
}

const CHECK_FIELDS = "Your question was not sent yet. Please check the fields marked below.";

/**
 * The form's server action, with or without JavaScript: the same schema as the form, then the
 * same submitQuestion as the JSON API. Success goes to the thank-you page; the status link is
 * only ever sent by e-mail.
 */
export async function askAction(_previous: AskFormState, form: FormData): Promise<AskFormState> {
  const raw = askFormFromFormData(form);
  const values = { ...raw, website: undefined };
  const parsed = askFormSchema.safeParse(raw);
  if (!parsed.success) return { status: "invalid", message: CHECK_FIELDS, errors: fieldErrors(parsed.error), values };

  let result: SubmitResult;
  try {
    // questionSchema keeps only its own fields, so the consent box (checked above) is dropped here.
    result = await submitQuestion(db(), raw, publicSubmitOptions(await headers(), "form"));
  } catch (error) {
    console.error("[ask] storing a question from the form failed:", error instanceof Error ? error.message : error);
    return { status: "failed", message: STORE_FAILED_MESSAGE, values };
  }
  if (!result.ok) {
    if (result.reason === "invalid") return { status: "invalid", message: CHECK_FIELDS, errors: result.errors, values };
    return { status: "limited", message: rateLimitMessage(result.retryAfterSeconds), values };
  }
  deliverConfirmationSoon();
  redirect(`/ask/sent?ref=${encodeURIComponent(result.reference)}`);
}
