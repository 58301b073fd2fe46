import { randomUUID } from "node:crypto";
import type { Kysely, Transaction } from "kysely";
import { z } from "zod";
import type { Database } from "@/db/types";
import { env } from "@/lib/env";

export const FALLBACK_MESSAGE_ID_HOST = "clearhall.invalid";

const noLineBreaks = (value: string) => !/[\r\n]/.test(value);

const mailSchema = z.object({
  kind: z.string().trim().min(1, "kind is required"),
  to: z.email("to is not a valid e-mail address"),
  subject: z
    .string()
    .trim()
    .min(1, "subject is required")
    .max(250, "subject is longer than 250 characters")
    .refine(noLineBreaks, "subject must be one line"),
  text: z.string().min(1, "text is required"),
  html: z.string().min(1).optional(),
});

export type MailMessage = z.input<typeof mailSchema>;

export interface EnqueueOptions {
  /** Host part of the Message-ID; defaults to the host of APP_URL. */
  host?: string;
}

export class InvalidMailError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "InvalidMailError";
  }
}

/** The host of a URL, for Message-IDs; the reserved `.invalid` name when there is none. */
export function messageIdHost(appUrl: string | undefined): string {
  if (!appUrl) return FALLBACK_MESSAGE_ID_HOST;
  try {
    return new URL(appUrl).hostname.replace(/^\[(.*)\]$/, "$1") || FALLBACK_MESSAGE_ID_HOST;
  } catch {
    // An unparseable URL has no host to offer; the Message-ID only needs to be unique.
    return FALLBACK_MESSAGE_ID_HOST;
  }
}

export function newMessageId(host: string): string {
  return `<${randomUUID()}@${host}>`;
}

/**
 * Queues one message. Pass the transaction that makes the change the message is about,
 * so the message is stored if and only if that change is.
 */
export async function enqueueMail(
  executor: Kysely<Database> | Transaction<Database>,
  message: MailMessage,
  now: Date = new Date(),
  options: EnqueueOptions = {},
): Promise<number> {
  const parsed = mailSchema.safeParse(message);
  if (!parsed.success) {
    // Issue messages name the field, never the value, so the address stays out of logs.
    throw new InvalidMailError(`Cannot queue mail: ${parsed.error.issues.map((i) => i.message).join("; ")}`);
  }
  const mail = parsed.data;
  const at = now.toISOString();
  const row = await executor
    .insertInto("outbox")
    .values({
      kind: mail.kind,
      to_address: mail.to,
      subject: mail.subject,
      text_body: mail.text,
      html_body: mail.html ?? null,
      status: "pending",
      next_attempt_at: at,
      message_id: newMessageId(options.host ?? messageIdHost(env().APP_URL)),
      created_at: at,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}
