import { db } from "@/db/client";
import { breathingZoneOutdoorAir, floorAreaFt2, isRoomUse, roomVolumeFt3 } from "@/lib/air";
import { ROOM_USE_LABELS } from "@/lib/rooms/labels";
import { listRooms } from "@/lib/rooms/repository";

const whole = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });
const oneDecimal = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });

/**
 * The school's rooms as the facilities team recorded them, with the outdoor air
 * each room needs for its use and design occupancy (ASHRAE 62.1 ventilation
 * rate procedure, breathing zone). Rounded here, for display only.
 */
export async function RoomFigures({ school }: { school?: string }) {
  const rooms = school ? await listRooms(db(), school) : [];
  if (rooms.length === 0) return <p className="my-6">Room figures for this school have not been entered yet.</p>;
  return (
    <div className="my-6">
      <div className="overflow-x-auto rounded-plate border-2 border-paper-line bg-white" tabIndex={0} role="region" aria-labelledby="room-figures-caption">
        <table className="w-full min-w-[36rem] border-collapse text-left text-sm">
          <caption id="room-figures-caption" className="p-3 text-left font-bold text-harbour-deep">
            Rooms and the outdoor air they need
          </caption>
          <thead>
            <tr className="border-b-2 border-harbour bg-paper-deep">
              <th scope="col" className="p-2">Room</th>
              <th scope="col" className="p-2">Used as</th>
              <th scope="col" className="p-2 text-right">Floor area (sq ft)</th>
              <th scope="col" className="p-2 text-right">Air volume (cu ft)</th>
              <th scope="col" className="p-2 text-right">Design occupancy</th>
              <th scope="col" className="p-2 text-right">Outdoor air needed (cfm)</th>
            </tr>
          </thead>
          <tbody>
            {rooms.map((r) => {
              const area = floorAreaFt2(r);
              const needed = isRoomUse(r.use) ? breathingZoneOutdoorAir({ use: r.use, people: r.occupancy, floorAreaFt2: area }) : null;
              return (
                <tr key={r.id} className="border-b border-paper-line">
                  <th scope="row" className="p-2 font-bold">{r.name}</th>
                  <td className="p-2">{ROOM_USE_LABELS[r.use] ?? r.use}</td>
                  <td className="p-2 text-right">{whole.format(area)}</td>
                  <td className="p-2 text-right">{whole.format(roomVolumeFt3(r))}</td>
                  <td className="p-2 text-right">{r.occupancy}</td>
                  <td className="p-2 text-right">{needed === null ? "—" : oneDecimal.format(needed)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <dl className="mt-3 space-y-1 text-sm">
        <div>
          <dt className="inline font-bold">Design occupancy: </dt>
          <dd className="inline">the most people the room is planned for, students and adults together.</dd>
        </div>
        <div>
          <dt className="inline font-bold">Outdoor air needed: </dt>
          <dd className="inline">
            how much fresh outdoor air, in cubic feet per minute (cfm), the ventilation standard our engineers use (ASHRAE
            Standard 62.1) asks for this room when it is full: an amount for each person plus an amount for the floor area.
          </dd>
        </div>
      </dl>
      <p className="mt-2 text-sm text-ink-soft">
        These figures are estimates from room sizes. They do not replace other measures, such as staying home when sick and
        washing hands.
      </p>
    </div>
  );
}
