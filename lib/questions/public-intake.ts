import "server-only";
import { after } from "next/server";
import { env } from "@/lib/env";
import { clientIp } from "@/lib/http/client-ip";
import { runningMailSender } from "@/lib/mail/worker";
import type { SubmitOptions } from "./submit";

/** Bigger than any valid question (2,000 characters of up to 4 bytes each, plus the other fields). */
export const QUESTION_BODY_MAX_BYTES = 16 * 1024;

/** The settings a public submission runs with, and the asker's address as far as we can trust it. */
export function publicSubmitOptions(headers: Headers, via: SubmitOptions["via"]): SubmitOptions {
  const settings = env();
  return {
    ip: clientIp(headers, settings.TRUST_PROXY),
    secret: settings.AUTH_SECRET,
    appUrl: settings.APP_URL,
    rateLimit: { count: settings.ASK_RATE_LIMIT_COUNT, windowMinutes: settings.ASK_RATE_LIMIT_WINDOW_MINUTES },
    via,
  };
}

/** After the response has gone, a delivery pass so the confirmation arrives in seconds, not at the next poll. */
export function deliverConfirmationSoon(): void {
  after(async () => {
    try {
      await runningMailSender()?.runNow();
    } catch (error) {
      // The message stays in the outbox; the sender's next pass tries again.
      console.error(`[ask] delivery pass after a new question failed: ${error instanceof Error ? error.message : String(error)}`);
    }
  });
}

export function rateLimitMessage(retryAfterSeconds: number): string {
  const minutes = Math.max(1, Math.ceil(retryAfterSeconds / 60));
  return `You have sent several questions in a short time, so this one was not sent. Please wait ${
    minutes === 1 ? "a minute" : `about ${minutes} minutes`
  } and try again. Your words are still here.`;
}

export const STORE_FAILED_MESSAGE =
  "We could not store your question just now, so nothing was sent. Please try again in a few minutes.";
