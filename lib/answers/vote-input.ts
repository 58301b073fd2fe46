import { z } from "zod";
import type { Vote } from "./votes";

const MAX_BYTES = 1024;

export const voteSchema = z.object({ vote: z.enum(["yes", "no"], "Say yes or no.") });

export type VoteInput =
  | { ok: true; vote: Vote; via: "form" | "json" }
  | { ok: false; status: 400 | 413 | 415; message: string; via: "form" | "json" };

async function readText(request: Request): Promise<string | null> {
  const reader = request.body?.getReader();
  if (!reader) return "";
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > MAX_BYTES) {
      await reader.cancel().catch(() => undefined);
      return null;
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString("utf8");
}

/**
 * A vote sent by the page's form (application/x-www-form-urlencoded, `vote=yes|no`, which
 * works without JavaScript) or as JSON (`{ "vote": "yes" | "no" }`). At most 1 kB.
 */
export async function readVote(request: Request): Promise<VoteInput> {
  const type = (request.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
  const via = type === "application/json" ? "json" : "form";
  if (type !== "application/json" && type !== "application/x-www-form-urlencoded") {
    return { ok: false, status: 415, message: "Send the vote as a form or as application/json.", via };
  }
  const text = await readText(request);
  if (text === null) return { ok: false, status: 413, message: "The body is larger than 1 kB.", via };
  let body: unknown;
  if (via === "json") {
    try {
      body = JSON.parse(text);
    } catch {
      return { ok: false, status: 400, message: "The body is not valid JSON.", via };
    }
  } else {
    body = Object.fromEntries(new URLSearchParams(text));
  }
  const parsed = voteSchema.safeParse(body);
  if (!parsed.success) return { ok: false, status: 400, message: "Say yes or no: send vote=yes or vote=no.", via };
  return { ok: true, vote: parsed.data.vote, via };
}
