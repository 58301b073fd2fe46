import Link from "next/link";
import { db } from "@/db/client";
import { districtName } from "@/lib/settings/district";

/**
 * The not-found page. Next sends this boundary inside the page data of every page (once per
 * route level), so it is kept small on purpose: the district's name and the ways back, not the
 * full site header and footer, which would otherwise travel two or three extra times with each
 * school page.
 */
export default async function NotFound() {
  const district = await districtName(db());
  return (
    <>
      <header className="border-b-4 border-harbour bg-paper-deep px-gutter py-4">
        <Link href="/" className="text-xl font-bold text-harbour-deep">
          {district}
        </Link>
      </header>
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
          <li>
            <Link href="/answers">Read the answers to families’ questions</Link>
          </li>
          <li>
            <Link href="/ask">Ask a question</Link>
          </li>
        </ul>
      </main>
    </>
  );
}
