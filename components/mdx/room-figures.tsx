import { PublicRoomTable } from "@/components/air/public-room-table";
import { db } from "@/db/client";
import { schoolRoomFigures } from "@/lib/rooms/figures";

/**
 * The school's rooms with their air figures, as the facilities team recorded and
 * measured them; computed here from the rooms table and the daily CO2 summaries.
 */
export async function RoomFigures({ school }: { school?: string }) {
  const figures = school ? await schoolRoomFigures(db(), school) : null;
  if (!figures || figures.rooms.length === 0) return <p className="my-6">Room figures for this school have not been entered yet.</p>;
  return <PublicRoomTable rooms={figures.rooms} settings={figures.settings} />;
}
