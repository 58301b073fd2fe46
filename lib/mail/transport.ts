import nodemailer from "nodemailer";
import type SMTPTransport from "nodemailer/lib/smtp-transport";

/** One message as the sender hands it to a transport. */
export interface OutgoingMail {
  from: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** Sent as the Message-ID header, so a receiver can drop a copy sent twice. */
  messageId: string;
}

/** What the sender needs from a transport; nodemailer's transporter fits, and so does a fake in tests. */
export interface MailTransport {
  sendMail(mail: OutgoingMail): Promise<{ messageId?: string }>;
}

/** Short enough that a dead or silent server fails the attempt instead of stalling the sender. */
export const SMTP_TIMEOUT_MS = 10_000;

function isLoopback(hostname: string): boolean {
  return hostname === "localhost" || hostname === "::1" || /^127(\.\d{1,3}){3}$/.test(hostname);
}

/** nodemailer options for an `smtp://` or `smtps://` URL; credentials come from its user:password part. */
export function smtpOptionsFromUrl(smtpUrl: string, timeoutMs = SMTP_TIMEOUT_MS): SMTPTransport.Options {
  let url: URL;
  try {
    url = new URL(smtpUrl);
  } catch (error) {
    throw new Error("SMTP_URL is not a valid URL", { cause: error });
  }
  if (url.protocol !== "smtp:" && url.protocol !== "smtps:") {
    throw new Error(`SMTP_URL must start with smtp:// or smtps://, not ${url.protocol}//`);
  }
  const host = url.hostname.replace(/^\[(.*)\]$/, "$1");
  const secure = url.protocol === "smtps:";
  const options: SMTPTransport.Options = {
    host,
    port: url.port ? Number(url.port) : secure ? 465 : 587,
    secure,
    connectionTimeout: timeoutMs,
    greetingTimeout: timeoutMs,
    socketTimeout: timeoutMs,
  };
  // A local catcher speaks plain SMTP and may advertise STARTTLS without a usable certificate.
  if (!secure && isLoopback(host)) options.ignoreTLS = true;
  if (url.username) {
    options.auth = { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) };
  }
  return options;
}

export function createSmtpTransport(smtpUrl: string, timeoutMs = SMTP_TIMEOUT_MS) {
  return nodemailer.createTransport(smtpOptionsFromUrl(smtpUrl, timeoutMs));
}
