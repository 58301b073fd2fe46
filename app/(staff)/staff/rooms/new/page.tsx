import Link from "next/link";
import { RoomForm } from "@/components/rooms/room-form";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { listSchools } from "@/lib/schools/repository";

export const metadata = { title: "Add a room" };

export default async function NewRoomPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.rooms, "/staff/rooms/new");
  const schools = await listSchools(db());
  return (
    <>
      <p>
        <Link href="/staff/rooms">← All rooms</Link>
      </p>
      <h1 className="mt-2 text-2xl">Add a room</h1>
      <p className="mt-1 mb-4 max-w-prose text-ink-soft">Enter the room as measured. Figures for families are computed from these values.</p>
      <RoomForm schools={schools.map((s) => ({ slug: s.slug, name: s.name }))} />
    </>
  );
}
