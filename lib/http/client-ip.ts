import { isIP } from "node:net";

export const UNKNOWN_CLIENT = "unknown";

/** An address as proxies write it ("1.2.3.4:5678", "[::1]:80", "::ffff:1.2.3.4") reduced to the bare address, or null. */
export function normalizeIp(raw: string): string | null {
  let value = raw.trim();
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(value);
  if (bracketed?.[1]) value = bracketed[1];
  const v4WithPort = /^(\d{1,3}(?:\.\d{1,3}){3}):\d+$/.exec(value);
  if (v4WithPort?.[1]) value = v4WithPort[1];
  value = value.replace(/%.*$/, "").toLowerCase();
  const mapped = /^::ffff:(\d{1,3}(?:\.\d{1,3}){3})$/.exec(value);
  if (mapped?.[1]) value = mapped[1];
  return isIP(value) ? value : null;
}

/**
 * The asker's IP address, for the rate limit only. Next.js copies the socket's address into
 * X-Forwarded-For only when the request has none, so without a trusted proxy the header is
 * whatever the client sent and means nothing: then every asker is "unknown" and shares one
 * limit. With `trustedProxies` = n, the address is the n-th entry from the right, the one the
 * outermost trusted proxy wrote; entries further left were written by the client and are ignored.
 */
export function clientIp(headers: Headers, trustedProxies: number): string {
  if (trustedProxies < 1) return UNKNOWN_CLIENT;
  const hops = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((h) => h.trim())
    .filter(Boolean);
  const entry = hops[hops.length - trustedProxies];
  return (entry && normalizeIp(entry)) ?? UNKNOWN_CLIENT;
}

function expandIpv6(ip: string): string[] {
  const [head = "", tail] = ip.split("::");
  const left = head ? head.split(":") : [];
  const right = tail ? tail.split(":") : [];
  // An embedded IPv4 tail (::1.2.3.4) is two groups.
  const last = right.length ? right[right.length - 1] : left[left.length - 1];
  if (last?.includes(".")) {
    const octets = last.split(".").map(Number);
    const groups = [((octets[0] ?? 0) << 8) | (octets[1] ?? 0), ((octets[2] ?? 0) << 8) | (octets[3] ?? 0)].map((n) => n.toString(16));
    if (right.length) right.splice(-1, 1, ...groups);
    else left.splice(-1, 1, ...groups);
  }
  const missing = ip.includes("::") ? 8 - left.length - right.length : 0;
  return [...left, ...Array<string>(missing).fill("0"), ...right].map((g) => g.padStart(4, "0"));
}

/** What the per-address limit counts: an IPv4 address, or an IPv6 /64 (one household or phone usually holds a whole /64). */
export function rateLimitAddressKey(ip: string): string {
  if (isIP(ip) !== 6) return ip;
  return `${expandIpv6(ip).slice(0, 4).join(":")}::/64`;
}
