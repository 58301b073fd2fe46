import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { currentStaff } from "@/lib/auth/guard";
import { safeCallbackUrl } from "@/lib/auth/callback-url";

export const metadata: Metadata = { title: "Staff sign-in", robots: { index: false } };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const callbackUrl = safeCallbackUrl((await searchParams).callbackUrl);
  if (await currentStaff()) redirect(callbackUrl);
  return (
    <main id="main" tabIndex={-1} className="mx-auto w-full max-w-md flex-1 px-gutter py-12 focus:outline-none">
      <p className="text-sm font-bold uppercase tracking-wide text-ink-soft">District staff</p>
      <h1 className="mt-1 text-3xl">Sign in to the question desk</h1>
      <p className="mt-3 mb-6">For communications, facilities and administration staff. Families do not need an account.</p>
      <div className="rounded-plate border-2 border-paper-line bg-white p-5">
        <SignInForm callbackUrl={callbackUrl} />
      </div>
      <p className="mt-6">
        <Link href="/">Back to the public site</Link>
      </p>
    </main>
  );
}
