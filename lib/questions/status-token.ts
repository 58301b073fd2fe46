import { createHash, randomBytes } from "node:crypto";

/** 32 random bytes (256 bits), base64url: 43 characters, safe in a URL path. */
const TOKEN_BYTES = 32;

export function hashStatusToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** A new private status token and the hash stored in its place; the token itself is never stored. */
export function newStatusToken(): { token: string; hash: string } {
  const token = randomBytes(TOKEN_BYTES).toString("base64url");
  return { token, hash: hashStatusToken(token) };
}

export function statusPath(token: string): string {
  return `/ask/status/${token}`;
}
