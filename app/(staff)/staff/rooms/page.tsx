import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { listRooms } from "@/lib/rooms/repository";
import { listSchools } from "@/lib/schools/repository";

export const metadata = { title: "Rooms" };

const number = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });

export default async function RoomsPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.rooms, "/staff/rooms");
  const [schools, rooms] = await Promise.all([listSchools(db()), listRooms(db())]);
  return (
    <>
      <h1 className="text-2xl">Rooms</h1>
      <p className="mt-2 text-ink-soft">Floor size, ceiling height and design occupancy of every room, by school.</p>
      {schools.map((school) => {
        const own = rooms.filter((r) => r.schoolSlug === school.slug);
        return (
          <section key={school.slug} aria-labelledby={`rooms-${school.slug}`} className="mt-6">
            <h2 id={`rooms-${school.slug}`} className="text-xl">
              {school.name} <span className="text-base font-normal text-ink-soft">({own.length} rooms)</span>
            </h2>
            <div className="mt-2 overflow-x-auto">
              <table className="w-full border-collapse text-left text-sm">
                <thead>
                  <tr className="border-b-2 border-harbour">
                    <th scope="col" className="py-2 pr-3">Room</th>
                    <th scope="col" className="py-2 pr-3">Use</th>
                    <th scope="col" className="py-2 pr-3">Floor (ft)</th>
                    <th scope="col" className="py-2 pr-3">Floor area (ft²)</th>
                    <th scope="col" className="py-2 pr-3">Ceiling (ft)</th>
                    <th scope="col" className="py-2 pr-3">Design occupancy</th>
                  </tr>
                </thead>
                <tbody>
                  {own.map((r) => (
                    <tr key={r.id} className="border-b border-paper-line">
                      <td className="py-2 pr-3 font-bold">{r.name}</td>
                      <td className="py-2 pr-3">{r.use.replaceAll("_", " ")}</td>
                      <td className="py-2 pr-3">
                        {number.format(r.lengthFt)} × {number.format(r.widthFt)}
                      </td>
                      <td className="py-2 pr-3">{number.format(r.lengthFt * r.widthFt)}</td>
                      <td className="py-2 pr-3">{number.format(r.ceilingFt)}</td>
                      <td className="py-2 pr-3">{r.occupancy}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </section>
        );
      })}
    </>
  );
}
