/** Our own sign pictures in public/signs/, each with the words printed beside it on the wall. */
export const SIGNS: Record<string, { label: string; meaning: string }> = {
  "one-way": { label: "One way", meaning: "Walk only in the direction of the arrow." },
  "keep-right": { label: "Keep right", meaning: "Stay on the right side of the hallway or stairs." },
  "wait-here": { label: "Wait here", meaning: "Stand on the mark until it is your turn." },
  "wash-hands": { label: "Wash hands", meaning: "Wash or sanitise your hands here before going on." },
  entrance: { label: "Entrance", meaning: "Come into the building through this door." },
  exit: { label: "Exit", meaning: "Leave the building through this door. The lit emergency exit signs still apply in an emergency." },
  "stairs-up": { label: "Stairs up", meaning: "These stairs are for going up only." },
  "stairs-down": { label: "Stairs down", meaning: "These stairs are for going down only." },
};

export function SignGallery({ signs = "" }: { signs?: string }) {
  const names = signs.split(",").map((s) => s.trim()).filter((s) => s in SIGNS);
  return (
    <ul className="my-6 grid grid-cols-2 gap-4 sm:grid-cols-4">
      {names.map((name) => {
        const sign = SIGNS[name]!;
        return (
          <li key={name} className="rounded-plate border-2 border-paper-line bg-white p-3 text-center">
            {/* eslint-disable-next-line @next/next/no-img-element -- a tiny static SVG needs no image optimisation */}
            <img src={`/signs/${name}.svg`} alt="" width={96} height={96} className="mx-auto h-24 w-24" />
            <p className="mt-2 font-bold">{sign.label}</p>
            <p className="text-sm">{sign.meaning}</p>
          </li>
        );
      })}
    </ul>
  );
}
