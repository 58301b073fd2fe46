import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { db } from "@/db/client";
import { env } from "@/lib/env";
import { signInSchema } from "@/lib/validation/sign-in";
import { authenticateStaff } from "./authenticate";
import { signInThrottle, TOO_MANY_ATTEMPTS } from "./throttle";

let cached: NextAuthOptions | undefined;

/** The address a sign-in came from, as the proxy in front reports it; null when none does. */
function clientAddress(headers: Record<string, unknown> | undefined): string | null {
  const forwarded = headers?.["x-forwarded-for"];
  const first = typeof forwarded === "string" ? forwarded.split(",")[0]?.trim() : undefined;
  return first || null;
}

/** Built on first use so `next build` never needs the secret. */
export function authOptions(): NextAuthOptions {
  if (cached) return cached;
  const settings = env();
  process.env.NEXTAUTH_URL ??= settings.APP_URL;
  cached = {
    secret: settings.AUTH_SECRET,
    session: { strategy: "jwt", maxAge: 8 * 60 * 60 },
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
          const address = clientAddress(request?.headers);
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
