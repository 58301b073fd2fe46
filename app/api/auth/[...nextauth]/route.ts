import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";

type Context = { params: Promise<{ nextauth: string[] }> };

async function handler(request: Request, context: Context): Promise<Response> {
  // next-auth v4 reads params synchronously; Next 16 hands them over as a promise.
  const params = await context.params;
  return NextAuth(request as never, { params } as never, authOptions());
}

export { handler as GET, handler as POST };
