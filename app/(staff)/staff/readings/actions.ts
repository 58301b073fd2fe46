"use server";

import { z } from "zod";
import { db } from "@/db/client";
import { AuthorizationError, requireRole } from "@/lib/auth/guard";
import { loadCo2Context, recomputeAllCo2Daily } from "@/lib/co2/summaries";
import { revalidateSchoolAir } from "@/lib/rooms/publish";
import { listSchools } from "@/lib/schools/repository";
import { AIR_SETTINGS_ROLES, airSettings, saveAirSettings } from "@/lib/settings/air";
import { airSettingsFormSchema } from "@/lib/validation/air-settings";

export interface AirSettingsResult {
  ok: boolean;
  message: string;
  errors?: Record<string, string>;
}

export async function saveAirSettingsAction(_previous: AirSettingsResult | null, form: FormData): Promise<AirSettingsResult> {
  try {
    await requireRole(AIR_SETTINGS_ROLES);
    const parsed = airSettingsFormSchema.safeParse(Object.fromEntries(form.entries()));
    if (!parsed.success) {
      const errors: Record<string, string> = {};
      for (const issue of parsed.error.issues) errors[String(issue.path[0] ?? "_form")] ??= issue.message;
      return { ok: false, message: "Nothing was saved; see the messages by the fields.", errors };
    }
    const before = await airSettings(db());
    await saveAirSettings(db(), parsed.data);
    const recount =
      before.co2ThresholdPpm !== parsed.data.co2ThresholdPpm ||
      before.occupiedStartMinute !== parsed.data.occupiedStartMinute ||
      before.occupiedEndMinute !== parsed.data.occupiedEndMinute;
    const days = recount ? await recomputeAllCo2Daily(db(), await loadCo2Context(db())) : null;
    for (const school of await listSchools(db())) revalidateSchoolAir(school.slug);
    return { ok: true, message: `Saved.${days === null ? "" : ` Daily CO2 figures recounted for ${days.toLocaleString("en-US")} room-days.`} The public pages show the change.` };
  } catch (error) {
    if (error instanceof AuthorizationError) return { ok: false, message: error.message };
    if (error instanceof z.ZodError) return { ok: false, message: "Nothing was saved: a value was not understood." };
    throw error;
  }
}
