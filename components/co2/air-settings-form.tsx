"use client";

import { useActionState } from "react";
import { saveAirSettingsAction, type AirSettingsResult } from "@/app/(staff)/staff/readings/actions";
import { TextField } from "@/components/ui/field";
import type { AirSettings } from "@/lib/settings/air";

const clock = (minute: number) => `${String(Math.floor(minute / 60)).padStart(2, "0")}:${String(minute % 60).padStart(2, "0")}`;

export function AirSettingsForm({ settings }: { settings: AirSettings }) {
  const [state, action, pending] = useActionState<AirSettingsResult | null, FormData>(saveAirSettingsAction, null);
  const e = state?.errors ?? {};
  return (
    <form action={action} className="max-w-2xl" aria-label="District air and seating choices">
      <div className="grid gap-x-6 sm:grid-cols-2">
        <TextField
          id="set-threshold"
          name="co2ThresholdPpm"
          label="CO2 level the daily minutes count above (ppm)"
          hint="The district's choice; no standard sets an indoor CO2 limit. Default 1,000."
          defaultValue={settings.co2ThresholdPpm}
          inputMode="numeric"
          error={e.co2ThresholdPpm}
        />
        <TextField
          id="set-outdoor"
          name="co2OutdoorPpm"
          label="Outdoor CO2 for the estimate (ppm)"
          hint="Default 420."
          defaultValue={settings.co2OutdoorPpm}
          inputMode="numeric"
          error={e.co2OutdoorPpm}
        />
        <TextField id="set-start" name="occupiedStart" label="School day starts" type="time" defaultValue={clock(settings.occupiedStartMinute)} error={e.occupiedStart} />
        <TextField id="set-end" name="occupiedEnd" label="School day ends" type="time" defaultValue={clock(settings.occupiedEndMinute)} error={e.occupiedEnd} />
        <TextField
          id="set-spacing"
          name="seatingSpacingFt"
          label="Spacing of the public seat counts (ft)"
          hint="Centre to centre. Default 6."
          defaultValue={settings.seatingSpacingFt}
          inputMode="decimal"
          error={e.seatingSpacingFt}
        />
        <TextField
          id="set-ez"
          name="zoneAirDistributionEffectiveness"
          label="Air distribution effectiveness (Ez)"
          hint="1.0 for ceiling supply of cool air; 0.8 for warm air supplied and returned at the ceiling."
          defaultValue={settings.zoneAirDistributionEffectiveness}
          inputMode="decimal"
          error={e.zoneAirDistributionEffectiveness}
        />
      </div>
      <button type="submit" disabled={pending} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep disabled:opacity-60">
        {pending ? "Saving…" : "Save district choices"}
      </button>
      <p role="status" aria-live="polite" className={state ? `mt-3 font-bold ${state.ok ? "text-leaf" : "text-ember-deep"}` : "sr-only"}>
        {state?.message}
      </p>
    </form>
  );
}
