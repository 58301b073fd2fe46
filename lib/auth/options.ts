import "server-only";
import type { CookieOption, NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { db } from "@/db/client";
import { env } from "@/lib/env";
import { clientIp, rateLimitAddressKey, UNKNOWN_CLIENT } from "@/lib/http/client-ip";
import { signInSchema } from "@/lib/validation/sign-in";
import { authenticateStaff } from "./authenticate";
import { signInThrottle, TOO_MANY_ATTEMPTS } from "./throttle";

let cached: NextAuthOptions | undefined;

/**
 * The address a sign-in came from, for the per-address throttle: the entry the trusted proxy
 * wrote (TRUST_PROXY), as for the question form's rate limit; null when no proxy is trusted.
 * Entries further left are whatever the client sent, and trusting them would let a guesser
 * pick a fresh address for every try, or use up someone else's.
 */
export function signInAddress(headers: Record<string, unknown> | undefined, trustedProxies: number): string | null {
  const forwarded = headers?.["x-forwarded-for"];
  const ip = clientIp(new Headers(typeof forwarded === "string" ? { "x-forwarded-for": forwarded } : {}), trustedProxies);
  return ip === UNKNOWN_CLIENT ? null : rateLimitAddressKey(ip);
}

/**
 * The session cookie: never readable by page scripts (httpOnly), not sent with cross-site
 * posts or embedded requests (SameSite=Lax), and, when the site is served over HTTPS, only
 * sent over HTTPS (Secure, with the __Secure- prefix browsers enforce).
 */
export function sessionCookie(appUrl: string): CookieOption {
  const secure = new URL(appUrl).protocol === "https:";
  return {
    name: `${secure ? "__Secure-" : ""}next-auth.session-token`,
    options: { httpOnly: true, sameSite: "lax", path: "/", secure },
  };
}

/** Built on first use so `next build` never needs the secret. */
export function authOptions(): NextAuthOptions {
  if (cached) return cached;
  const settings = env();
  process.env.NEXTAUTH_URL ??= settings.APP_URL;
  cached = {
    secret: settings.AUTH_SECRET,
    session: { strategy: "jwt", maxAge: 8 * 60 * 60 },
    // From APP_URL, not from how a request arrived: behind a TLS-terminating proxy the app sees http.
    useSecureCookies: new URL(settings.APP_URL).protocol === "https:",
    cookies: { sessionToken: sessionCookie(settings.APP_URL) },
    pages: { signIn: "/signin", error: "/signin" },
    providers: [
      CredentialsProvider({
        name: "Staff e-mail and password",
        credentials: {
          email: { label: "E-mail", type: "email" },
          password: { label: "Password", type: "password" },
        },
        async authorize(credentials, request) {
          const parsed = signInSchema.safeParse(credentials);
          if (!parsed.success) return null;
          const account = parsed.data.email.trim().toLowerCase();
          const address = signInAddress(request?.headers, settings.TRUST_PROXY);
          const throttle = signInThrottle();
          // Refused before the password is checked, so a guess made while limited learns nothing.
          if (throttle.isLimited(account, address)) throw new Error(TOO_MANY_ATTEMPTS);
          const user = await authenticateStaff(db(), account, parsed.data.password);
          if (!user) {
            throttle.recordFailure(account, address);
            return null;
          }
          throttle.recordSuccess(account);
          return { id: String(user.id), name: user.name, email: user.email, role: user.role };
        },
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) {
          token.uid = user.id;
          token.role = user.role;
        }
        return token;
      },
      session({ session, token }) {
        if (token.uid && token.role) session.user = { ...session.user, id: token.uid, role: token.role };
        return session;
      },
    },
  };
  return cached;
}
