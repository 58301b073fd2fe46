import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { db } from "@/db/client";
import { env } from "@/lib/env";
import { signInSchema } from "@/lib/validation/sign-in";
import { authenticateStaff } from "./authenticate";

let cached: NextAuthOptions | undefined;

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
        async authorize(credentials) {
          const parsed = signInSchema.safeParse(credentials);
          if (!parsed.success) return null;
          const user = await authenticateStaff(db(), parsed.data.email, parsed.data.password);
          return user ? { id: String(user.id), name: user.name, email: user.email, role: user.role } : null;
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
