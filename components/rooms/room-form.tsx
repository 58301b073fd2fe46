"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch, type Resolver } from "react-hook-form";
import { SelectField, TextField } from "@/components/ui/field";
import { FormProblems, problemsOf } from "@/components/ui/form-problems";
import { SubmitButton } from "@/components/ui/submit-button";
import { ROOM_USES, type RoomUse } from "@/lib/air/ventilation";
import { cfmToLitresPerSecond, feetToMetres, litresPerSecondToCfm, metresToFeet } from "@/lib/air/units";
import { ROOM_USE_LABELS } from "@/lib/rooms/labels";
import { roomInputSchema, type RoomRecord, type UnitSystem } from "@/lib/validation/room";

export interface RoomFormValues {
  name: string;
  use: RoomUse;
  units: UnitSystem;
  length: string;
  width: string;
  ceiling: string;
  occupancy: string;
  outdoorAir: string;
  airCleaners: string;
  cadrEach: string;
  merv: string;
  windowsOpen: boolean;
}

export interface RoomFormProps {
  /** Edit this room, or (without it) add a room to one of `schools`. */
  room?: { id: number } & RoomRecord;
  schools?: { slug: string; name: string }[];
}

const LENGTH_FIELDS = ["length", "width", "ceiling"] as const;

/** The form's fields in page order, for the list of what to fix. */
const FIELD_IDS = [
  { name: "name", id: "room-name", label: "Room name" },
  { name: "use", id: "room-use", label: "Used as" },
  { name: "length", id: "room-length", label: "Floor length" },
  { name: "width", id: "room-width", label: "Floor width" },
  { name: "ceiling", id: "room-ceiling", label: "Ceiling height" },
  { name: "occupancy", id: "room-occupancy", label: "Design occupancy" },
  { name: "outdoorAir", id: "room-outdoor-air", label: "Outdoor air" },
  { name: "airCleaners", id: "room-air-cleaners", label: "Portable air cleaners" },
  { name: "cadrEach", id: "room-cadr", label: "CADR of each air cleaner" },
  { name: "merv", id: "room-merv", label: "Filter rating (MERV)" },
];
const FLOW_FIELDS = ["outdoorAir", "cadrEach"] as const;

// Enough decimals that a value converted and converted back is the one typed.
const shown = (n: number) => String(Number(n.toFixed(3)));

function valuesOf(room: RoomRecord | undefined): RoomFormValues {
  return {
    name: room?.name ?? "",
    use: room?.use ?? "classroom_9_plus",
    units: "us",
    length: room ? shown(room.lengthFt) : "",
    width: room ? shown(room.widthFt) : "",
    ceiling: room ? shown(room.ceilingFt) : "",
    occupancy: room ? String(room.occupancy) : "",
    outdoorAir: room ? shown(room.outdoorAirCfm) : "",
    airCleaners: room ? String(room.airCleaners) : "0",
    cadrEach: room && room.airCleaners > 0 ? shown(room.cadrCfmEach) : "",
    merv: room?.merv ? String(room.merv) : "",
    windowsOpen: room?.windowsOpen ?? false,
  };
}

export function RoomForm({ room, schools = [] }: RoomFormProps) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const [school, setSchool] = useState(schools[0]?.slug ?? "");
  const {
    register,
    handleSubmit,
    getValues,
    setValue,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<RoomFormValues, unknown, RoomRecord>({
    resolver: zodResolver(roomInputSchema) as unknown as Resolver<RoomFormValues, unknown, RoomRecord>,
    defaultValues: valuesOf(room),
  });
  const units = useWatch({ control, name: "units" });
  const airCleaners = useWatch({ control, name: "airCleaners" });
  const length = units === "us" ? "ft" : "m";
  const flow = units === "us" ? "cfm" : "L/s";

  // Switching units converts what is in the boxes, so nothing has to be typed again.
  function switchUnits(next: UnitSystem) {
    const current = getValues("units");
    if (next === current) return;
    const convert = (text: string, fn: (n: number) => number) => {
      const n = Number(text);
      return text.trim() === "" || !Number.isFinite(n) ? text : shown(fn(n));
    };
    for (const key of LENGTH_FIELDS) setValue(key, convert(getValues(key), next === "metric" ? feetToMetres : metresToFeet));
    for (const key of FLOW_FIELDS) setValue(key, convert(getValues(key), next === "metric" ? cfmToLitresPerSecond : litresPerSecondToCfm));
    setValue("units", next);
  }

  async function onSubmit(record: RoomRecord) {
    setStatus(null);
    // Sent in feet and cfm: the form's schema has already converted.
    const body = {
      ...(room ? {} : { school }),
      name: record.name,
      use: record.use,
      units: "us",
      length: record.lengthFt,
      width: record.widthFt,
      ceiling: record.ceilingFt,
      occupancy: record.occupancy,
      outdoorAir: record.outdoorAirCfm,
      airCleaners: record.airCleaners,
      cadrEach: record.cadrCfmEach,
      merv: record.merv,
      windowsOpen: record.windowsOpen,
    };
    let response: Response;
    try {
      response = await fetch(room ? `/api/staff/rooms/${room.id}` : "/api/staff/rooms", {
        method: room ? "PATCH" : "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(body),
      });
    } catch {
      setStatus({ ok: false, message: "The room could not be saved: the connection failed. Nothing was changed; try again." });
      return;
    }
    const answer = (await response.json().catch(() => ({}))) as { room?: { id: number; name: string }; errors?: Record<string, string>; error?: string };
    if (response.ok && answer.room) {
      setStatus({ ok: true, message: `${answer.room.name}: saved. The school's public Fresh air page shows the new figures.` });
      if (room) router.refresh();
      else router.push(`/staff/rooms/${answer.room.id}`);
      return;
    }
    for (const [field, message] of Object.entries(answer.errors ?? {})) {
      if (field in body || field === "cadrEach") setError(field as keyof RoomFormValues, { message });
    }
    setStatus({ ok: false, message: answer.error ?? "Some values need a change; see the messages by the fields. Nothing was saved." });
  }

  return (
    <form onSubmit={handleSubmit(onSubmit, () => setStatus(null))} noValidate className="max-w-2xl" aria-label={room ? `Edit ${room.name}` : "Add a room"}>
      <FormProblems id={room ? `room-${room.id}-problems` : "room-new-problems"} title={room ? "Not saved" : "Not added"} problems={problemsOf(FIELD_IDS, errors)} />
      {!room ? (
        <SelectField
          id="room-school"
          label="School"
          value={school}
          onChange={(e) => setSchool(e.target.value)}
          options={schools.map((s) => ({ value: s.slug, label: s.name }))}
        />
      ) : null}
      <div className="grid gap-x-6 sm:grid-cols-2">
        <TextField id="room-name" label="Room name" autoComplete="off" error={errors.name?.message} {...register("name")} />
        <SelectField
          id="room-use"
          label="Used as"
          options={ROOM_USES.map((u) => ({ value: u, label: ROOM_USE_LABELS[u] ?? u }))}
          error={errors.use?.message}
          {...register("use")}
        />
      </div>
      <fieldset className="mb-5">
        <legend className="font-bold">Units</legend>
        <div className="flex flex-wrap gap-4">
          {(
            [
              ["us", "Feet and cfm"],
              ["metric", "Metres and litres per second"],
            ] as const
          ).map(([value, label]) => (
            <label key={value} className="flex min-h-11 items-center gap-2">
              <input type="radio" name="units-choice" value={value} checked={units === value} onChange={() => switchUnits(value)} className="h-5 w-5 accent-harbour" />
              {label}
            </label>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-x-6 sm:grid-cols-3">
        <TextField id="room-length" label={`Floor length (${length})`} inputMode="decimal" hint="Front wall to back wall" error={errors.length?.message} {...register("length")} />
        <TextField id="room-width" label={`Floor width (${length})`} inputMode="decimal" error={errors.width?.message} {...register("width")} />
        <TextField id="room-ceiling" label={`Ceiling height (${length})`} inputMode="decimal" error={errors.ceiling?.message} {...register("ceiling")} />
      </div>
      <div className="grid gap-x-6 sm:grid-cols-2">
        <TextField id="room-occupancy" label="Design occupancy" inputMode="numeric" hint="Students and adults the room is planned for" error={errors.occupancy?.message} {...register("occupancy")} />
        <TextField
          id="room-outdoor-air"
          label={`Outdoor air (${flow})`}
          inputMode="decimal"
          hint="From the unit ventilator or air handler, as last measured"
          error={errors.outdoorAir?.message}
          {...register("outdoorAir")}
        />
        <TextField id="room-air-cleaners" label="Portable air cleaners" inputMode="numeric" hint="How many; 0 for none" error={errors.airCleaners?.message} {...register("airCleaners")} />
        <TextField
          id="room-cadr"
          label={`CADR of each air cleaner (${flow})`}
          inputMode="decimal"
          hint={airCleaners.trim() === "0" ? "Only needed when the room has air cleaners" : "Clean air delivery rate, from the label"}
          error={errors.cadrEach?.message}
          {...register("cadrEach")}
        />
        <TextField id="room-merv" label="Filter rating (MERV)" inputMode="numeric" hint="1 to 16; leave empty when not known" error={errors.merv?.message} {...register("merv")} />
      </div>
      <div className="mb-5">
        <label className="flex min-h-11 items-center gap-2 font-bold">
          <input type="checkbox" className="h-5 w-5 accent-harbour" {...register("windowsOpen")} />
          Windows open
        </label>
      </div>
      <SubmitButton busy={isSubmitting} busyLabel="Saving…">
        {room ? "Save room" : "Add room"}
      </SubmitButton>
      <p role="status" aria-live="polite" className={status ? `mt-3 font-bold ${status.ok ? "text-leaf" : "text-ember-deep"}` : "sr-only"}>
        {status?.message}
      </p>
    </form>
  );
}
