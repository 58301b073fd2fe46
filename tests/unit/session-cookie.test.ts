import { describe, expect, it } from "vitest";
import { authOptions, sessionCookie, signInAddress } from "@/lib/auth/options";

describe("the staff session cookie", () => {
  it("is httpOnly and SameSite=Lax on every site, and Secure with the __Secure- prefix when APP_URL is https", () => {
    expect(sessionCookie("http://localhost:3000")).toEqual({
      name: "next-auth.session-token",
      options: { httpOnly: true, sameSite: "lax", path: "/", secure: false },
    });
    expect(sessionCookie("https://reopening.wrenmoor.example.org")).toEqual({
      name: "__Secure-next-auth.session-token",
      options: { httpOnly: true, sameSite: "lax", path: "/", secure: true },
    });
  });

  it("is what next-auth is configured with, following APP_URL (http in tests)", () => {
    const options = authOptions();
    expect(options.cookies?.sessionToken).toEqual(sessionCookie(process.env.APP_URL ?? "http://localhost:3000"));
    expect(options.useSecureCookies).toBe(false);
    expect(options.session).toMatchObject({ strategy: "jwt", maxAge: 8 * 60 * 60 });
  });
});

describe("the address the sign-in throttle counts", () => {
  it("is the entry the trusted proxy added, not what the client wrote in front of it", () => {
    expect(signInAddress({ "x-forwarded-for": "203.0.113.9, 198.51.100.4" }, 1)).toBe("198.51.100.4");
    expect(signInAddress({ "x-forwarded-for": "203.0.113.9, 198.51.100.4, 10.0.0.2" }, 2)).toBe("198.51.100.4");
  });

  it("is unknown (no per-address limit, the per-account one still applies) when no proxy is trusted", () => {
    // Without a trusted proxy the header is whatever the client sent: a guesser could name a new address each try.
    expect(signInAddress({ "x-forwarded-for": "203.0.113.9" }, 0)).toBeNull();
    expect(signInAddress({}, 1)).toBeNull();
    expect(signInAddress(undefined, 1)).toBeNull();
    expect(signInAddress({ "x-forwarded-for": "not-an-address" }, 1)).toBeNull();
  });

  it("counts an IPv6 client by its /64, as the question form's rate limit does", () => {
    expect(signInAddress({ "x-forwarded-for": "2001:db8:1:2:aaaa::1" }, 1)).toBe("2001:0db8:0001:0002::/64");
    expect(signInAddress({ "x-forwarded-for": "2001:db8:1:2:bbbb::7" }, 1)).toBe("2001:0db8:0001:0002::/64");
  });
});
