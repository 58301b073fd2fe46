import type { SeatingPlanDrawing } from "@/lib/seating/plan-svg";

export interface SeatingPlanProps {
  drawing: SeatingPlanDrawing;
  /** Short name for the drawing, e.g. "Seating plan for Room 101". */
  title: string;
  id: string;
}

const STYLE: Record<string, { fill: string; stroke: string; strokeWidth: number; dash?: string }> = {
  room: { fill: "#ffffff", stroke: "#1d3a5f", strokeWidth: 0.25 },
  teacher_zone: { fill: "#f3ecdf", stroke: "none", strokeWidth: 0 },
  desk_area: { fill: "none", stroke: "#45505c", strokeWidth: 0.08, dash: "0.4 0.3" },
  spacing: { fill: "#e3eaf3", stroke: "#9fb3cb", strokeWidth: 0.06 },
  desk: { fill: "#ffffff", stroke: "#1c2530", strokeWidth: 0.1 },
  seat: { fill: "#1d3a5f", stroke: "none", strokeWidth: 0 },
};

/**
 * A room's distanced layout drawn to scale (front at the top). The drawing is one
 * image to assistive technology, named by its title and described in words; the
 * seat count is in the description and in text beside it.
 */
export function SeatingPlan({ drawing, title, id }: SeatingPlanProps) {
  // About 1 ft tall in a classroom drawing: legible, and smaller than a desk.
  const labelSize = Math.max(0.8, Math.min(1.1, drawing.widthFt / 26));
  return (
    <svg
      viewBox={drawing.viewBox}
      role="img"
      aria-labelledby={`${id}-title ${id}-desc`}
      className="h-auto w-full max-w-md rounded-plate border-2 border-paper-line bg-white"
      preserveAspectRatio="xMidYMid meet"
      data-testid="seating-plan"
    >
      <title id={`${id}-title`}>{title}</title>
      <desc id={`${id}-desc`}>{drawing.description}</desc>
      {drawing.shapes.map((shape, i) => {
        if (shape.kind === "rect") {
          const s = STYLE[shape.role]!;
          return <rect key={i} x={shape.x} y={shape.y} width={shape.width} height={shape.height} fill={s.fill} stroke={s.stroke} strokeWidth={s.strokeWidth} strokeDasharray={s.dash} rx={shape.role === "desk" ? 0.15 : 0} />;
        }
        if (shape.kind === "circle") {
          const s = STYLE[shape.role]!;
          return <circle key={i} cx={shape.cx} cy={shape.cy} r={shape.r} fill={s.fill} stroke={s.stroke} strokeWidth={s.strokeWidth} />;
        }
        return (
          <text key={i} x={shape.x} y={shape.y} fontSize={labelSize} textAnchor="middle" dominantBaseline="middle" fill="#45505c" fontWeight="bold">
            {shape.text} (teacher zone)
          </text>
        );
      })}
    </svg>
  );
}
