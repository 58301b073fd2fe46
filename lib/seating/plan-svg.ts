// A seating plan as plain SVG primitives in feet (viewBox 0 0 width length, front
// at the top), for a React component to map to <rect>/<circle>/<text>, plus a
// text description for the drawing's accessible name.

import { DEFAULT_TEACHER_ZONE_FT, seatsThatFit, type SeatingInput, type SeatingLayout } from "./layout";

export type PlanShape =
  | { kind: "rect"; role: "room" | "teacher_zone" | "desk_area" | "desk"; x: number; y: number; width: number; height: number }
  | { kind: "circle"; role: "seat" | "spacing"; cx: number; cy: number; r: number }
  | { kind: "label"; role: "front"; x: number; y: number; text: string };

export interface SeatingPlanDrawing {
  viewBox: string;
  widthFt: number;
  lengthFt: number;
  /** Drawn in order: room, teacher zone, desk area, spacing circles, desks, seats, label. */
  shapes: PlanShape[];
  description: string;
}

const SEAT_MARKER_MAX_RADIUS_FT = 0.75;

function feet(value: number): string {
  return `${Number(value.toFixed(1))}`;
}

export function describePlan(input: SeatingInput, layout: SeatingLayout = seatsThatFit(input)): string {
  const teacherZone = input.teacherZoneFt ?? DEFAULT_TEACHER_ZONE_FT;
  const room = `Room ${feet(input.widthFt)} feet wide and ${feet(input.lengthFt)} feet long, with a teacher zone ${feet(teacherZone)} feet deep at the front.`;
  const hasDesk = layout.desk.widthFt > 0 || layout.desk.depthFt > 0;
  const desks = hasDesk ? `desks ${feet(layout.desk.widthFt)} by ${feet(layout.desk.depthFt)} feet` : "seats";
  if (layout.count === 0) {
    return `${room} No ${desks} fit ${feet(layout.spacingFt)} feet apart, centre to centre, once the teacher zone and wall clearance are kept.`;
  }
  const noun = hasDesk ? (layout.count === 1 ? "desk" : "desks") : layout.count === 1 ? "seat" : "seats";
  const seats = `${layout.count} ${noun}`;
  const size = hasDesk ? ` (each ${feet(layout.desk.widthFt)} by ${feet(layout.desk.depthFt)} feet)` : "";
  if (layout.layout === "grid") {
    return `${room} ${seats}${size} in straight rows, each at least ${feet(layout.spacingFt)} feet from the next, centre to centre.`;
  }
  const rows = layout.orientation === "rows_along" ? "staggered rows running front to back" : "staggered rows across the room";
  return `${room} ${seats}${size} in ${rows}, each at least ${feet(layout.spacingFt)} feet from the next, centre to centre; straight rows would seat ${layout.alternatives.grid}.`;
}

export function seatingPlan(input: SeatingInput, layout: SeatingLayout = seatsThatFit(input)): SeatingPlanDrawing {
  const teacherZone = Math.min(input.teacherZoneFt ?? DEFAULT_TEACHER_ZONE_FT, input.lengthFt);
  const seatRadius = Math.min(SEAT_MARKER_MAX_RADIUS_FT, layout.spacingFt / 4);
  const shapes: PlanShape[] = [
    { kind: "rect", role: "room", x: 0, y: 0, width: input.widthFt, height: input.lengthFt },
    { kind: "rect", role: "teacher_zone", x: 0, y: 0, width: input.widthFt, height: teacherZone },
  ];
  if (layout.deskArea.widthFt > 0 && layout.deskArea.lengthFt > 0) {
    const a = layout.deskArea;
    shapes.push({ kind: "rect", role: "desk_area", x: a.x, y: a.y, width: a.widthFt, height: a.lengthFt });
  }
  // Circles of half the spacing touch but never overlap: the spacing made visible.
  for (const seat of layout.seats) shapes.push({ kind: "circle", role: "spacing", cx: seat.x, cy: seat.y, r: layout.spacingFt / 2 });
  const { widthFt: dw, depthFt: dd } = layout.desk;
  if (dw > 0 && dd > 0) {
    for (const seat of layout.seats) shapes.push({ kind: "rect", role: "desk", x: seat.x - dw / 2, y: seat.y - dd / 2, width: dw, height: dd });
  }
  for (const seat of layout.seats) shapes.push({ kind: "circle", role: "seat", cx: seat.x, cy: seat.y, r: seatRadius });
  shapes.push({ kind: "label", role: "front", x: input.widthFt / 2, y: teacherZone / 2, text: "Front" });
  return {
    viewBox: `0 0 ${input.widthFt} ${input.lengthFt}`,
    widthFt: input.widthFt,
    lengthFt: input.lengthFt,
    shapes,
    description: describePlan(input, layout),
  };
}
