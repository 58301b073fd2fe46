import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { STATE_LABELS, TOPIC_LABELS } from "@/lib/questions/labels";
import { listOpenQuestions } from "@/lib/questions/repository";

export const metadata = { title: "Questions waiting" };

const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone: "America/New_York" });

export default async function DeskPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.desk, "/staff/desk");
  const rows = await listOpenQuestions(db());
  return (
    <>
      <h1 className="text-2xl">Questions waiting for a reply</h1>
      <p className="mt-2 text-ink-soft">Oldest first. Technical questions need a facilities check before the reply goes out.</p>
      {rows.length === 0 ? (
        <p className="mt-4">Nobody is waiting for an answer right now.</p>
      ) : (
        <div className="mt-4 overflow-x-auto">
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">Questions waiting, oldest first</caption>
            <thead>
              <tr className="border-b-2 border-harbour">
                <th scope="col" className="py-2 pr-3">Reference</th>
                <th scope="col" className="py-2 pr-3">Received</th>
                <th scope="col" className="py-2 pr-3">School</th>
                <th scope="col" className="py-2 pr-3">Topic</th>
                <th scope="col" className="py-2 pr-3">Where it is</th>
                <th scope="col" className="py-2 pr-3">Facilities check</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr key={r.id} className="border-b border-paper-line">
                  <td className="py-2 pr-3 font-bold">{r.reference}</td>
                  <td className="py-2 pr-3">{dateFormat.format(new Date(r.receivedAt))}</td>
                  <td className="py-2 pr-3">{r.school ?? "District-wide"}</td>
                  <td className="py-2 pr-3">{TOPIC_LABELS[r.topic] ?? r.topic}</td>
                  <td className="py-2 pr-3">{STATE_LABELS[r.state] ?? r.state}</td>
                  <td className="py-2 pr-3">{r.technical ? "Needed" : "Not needed"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}
