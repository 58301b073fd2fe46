import { AccountControls } from "@/components/staff/account-controls";
import { NewAccountForm } from "@/components/staff/new-account-form";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { listStaffAccounts } from "@/lib/staff/accounts";

export const metadata = { title: "Staff accounts" };

export default async function StaffAccountsPage() {
  const me = await requireStaffPage(STAFF_PAGE_ROLES.users, "/staff/users");
  const accounts = await listStaffAccounts(db());
  return (
    <>
      <h1 className="text-2xl">Staff accounts</h1>
      <p className="mt-2 max-w-prose text-ink-soft">
        Who can sign in, and what each person may do. A turned-off account cannot sign in; its history stays. The district
        always keeps at least one active administrator.
      </p>
      <ul className="mt-4 divide-y divide-paper-line rounded-plate border-2 border-paper-line bg-white">
        {accounts.map((a) => (
          <li key={a.id} className="grid gap-2 p-4 md:grid-cols-[1fr_auto]" data-testid={`account-${a.email}`}>
            <div>
              <p className="font-bold">
                {a.name} {a.id === me.id ? <span className="font-normal text-ink-soft">(you)</span> : null}
              </p>
              <p className="text-sm">{a.email}</p>
              <p className="text-sm">
                {ROLE_LABELS[a.role]} · {a.disabledAt ? <strong className="text-ember-deep">Turned off</strong> : "Active"}
              </p>
            </div>
            <AccountControls id={a.id} name={a.name} role={a.role} disabled={a.disabledAt !== null} />
          </li>
        ))}
      </ul>
      <section aria-labelledby="add" className="mt-8">
        <h2 id="add" className="text-xl">
          Add a staff member
        </h2>
        <div className="mt-3 rounded-plate border-2 border-paper-line bg-white p-5">
          <NewAccountForm />
        </div>
      </section>
    </>
  );
}
