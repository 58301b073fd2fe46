/** Only a path on this site: an absolute or protocol-relative URL would let a link send staff elsewhere after sign-in. */
export function safeCallbackUrl(value: unknown, fallback = "/staff"): string {
  if (typeof value !== "string" || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return fallback;
  return value;
}
