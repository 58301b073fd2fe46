import Link from "next/link";
import { SiteFooter } from "@/components/site/site-footer";
import { SiteHeader } from "@/components/site/site-header";

export default function NotFound() {
  return (
    <>
      <SiteHeader />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-prose flex-1 px-gutter py-12 focus:outline-none">
        <h1 className="text-3xl">We could not find that page</h1>
        <p className="mt-4 text-lg">
          The link may be old, or the address may have a typing mistake. Nothing is wrong with your device.
        </p>
        <ul className="mt-6 list-disc pl-6">
          <li>
            <Link href="/">Go to the reopening home page</Link>
          </li>
          <li>
            <Link href="/schools">Find your school</Link>
          </li>
        </ul>
      </main>
      <SiteFooter />
    </>
  );
}
