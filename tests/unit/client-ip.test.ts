import { describe, expect, it } from "vitest";
import { clientIp, normalizeIp, rateLimitAddressKey, UNKNOWN_CLIENT } from "@/lib/http/client-ip";

const forwarded = (value?: string) => new Headers(value === undefined ? {} : { "x-forwarded-for": value });

describe("clientIp", () => {
  it("trusts nothing without TRUST_PROXY: every asker is 'unknown'", () => {
    expect(clientIp(forwarded("203.0.113.9"), 0)).toBe(UNKNOWN_CLIENT);
  });

  it("takes the entry the trusted proxy wrote, ignoring what the client put before it", () => {
    expect(clientIp(forwarded("203.0.113.9"), 1)).toBe("203.0.113.9");
    expect(clientIp(forwarded("6.6.6.6, 203.0.113.9"), 1)).toBe("203.0.113.9");
    expect(clientIp(forwarded("6.6.6.6, 203.0.113.9, 198.51.100.2"), 2)).toBe("203.0.113.9");
  });

  it("is 'unknown' when the header is missing, too short or not an address", () => {
    expect(clientIp(forwarded(), 1)).toBe(UNKNOWN_CLIENT);
    expect(clientIp(forwarded("203.0.113.9"), 2)).toBe(UNKNOWN_CLIENT);
    expect(clientIp(forwarded("not-an-ip"), 1)).toBe(UNKNOWN_CLIENT);
  });
});

describe("normalizeIp and rateLimitAddressKey", () => {
  it("strips ports, brackets, zones and the IPv4-mapped prefix", () => {
    expect(normalizeIp("203.0.113.9:5555")).toBe("203.0.113.9");
    expect(normalizeIp("[2001:db8::1]:443")).toBe("2001:db8::1");
    expect(normalizeIp("::ffff:203.0.113.9")).toBe("203.0.113.9");
    expect(normalizeIp("fe80::1%eth0")).toBe("fe80::1");
    expect(normalizeIp("999.1.1.1")).toBeNull();
  });

  it("counts IPv6 by /64, so one household cannot rotate through its addresses", () => {
    expect(rateLimitAddressKey("2001:db8:aa:bb:1:2:3:4")).toBe(rateLimitAddressKey("2001:db8:aa:bb:ffff::9"));
    expect(rateLimitAddressKey("2001:db8:aa:bb::1")).not.toBe(rateLimitAddressKey("2001:db8:aa:bc::1"));
    expect(rateLimitAddressKey("203.0.113.9")).toBe("203.0.113.9");
  });
});
