import Link from "next/link";
import { currentStaff } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/roles";

export const metadata = { title: "Not available for your role" };

export default async function NotAllowedPage() {
  const user = await currentStaff();
  return (
    <div className="max-w-prose">
      <h1 className="text-2xl">This page is not part of your role</h1>
      <p className="mt-3">
        You are signed in{user ? ` as ${ROLE_LABELS[user.role]}` : ""}. If you need this page for your work, ask a district
        administrator to change your role.
      </p>
      <p className="mt-4">
        <Link href="/staff">Back to the staff overview</Link>
      </p>
    </div>
  );
}
