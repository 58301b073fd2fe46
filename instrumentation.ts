/**
 * Runs once when a Next.js server starts: checks every setting, so a bad one stops start-up with
 * a clear message, then starts the mail sender in this process. Imports are dynamic so the edge
 * bundle never pulls in better-sqlite3 or nodemailer.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;

  const { env } = await import("@/lib/env");
  let settings: ReturnType<typeof env>;
  try {
    settings = env();
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    // Next.js logs a failed hook and keeps serving; a server without its settings must not.
    if (process.env.NODE_ENV === "production") process.exit(1);
    throw error;
  }

  if (settings.MAIL_SENDER_DISABLED || process.env.NEXT_PHASE === "phase-production-build") return;

  const [{ sharedDatabase }, { createSmtpTransport, startMailSender }] = await Promise.all([
    import("@/db/shared"),
    import("@/lib/mail"),
  ]);

  startMailSender({
    db: sharedDatabase(),
    transport: createSmtpTransport(settings.SMTP_URL),
    from: settings.MAIL_FROM,
    intervalMs: settings.MAIL_SENDER_INTERVAL_MS,
    maxAttempts: settings.MAIL_MAX_ATTEMPTS,
  });
}
