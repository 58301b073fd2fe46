/**
 * The IANA time zone name as the runtime spells it ("america/chicago" →
 * "America/Chicago", "US/Eastern" → "America/New_York"), or null when the runtime
 * knows no such zone. Only Area/Location names and UTC are taken: an offset such as
 * "+05:00" ignores daylight saving time, and an abbreviation is ambiguous (the
 * runtime reads "EST" as America/Panama, which has no daylight saving time).
 */
export function canonicalTimeZone(value: string): string | null {
  const name = value.trim();
  if (!/^(UTC|[A-Za-z_]+(\/[A-Za-z0-9_+-]+)+)$/i.test(name)) return null;
  try {
    return new Intl.DateTimeFormat("en-US", { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

/** The zone names the runtime knows, for suggestions in a form; empty where the runtime cannot list them. */
export function knownTimeZones(): string[] {
  const intl = Intl as typeof Intl & { supportedValuesOf?: (key: "timeZone") => string[] };
  return typeof intl.supportedValuesOf === "function" ? intl.supportedValuesOf("timeZone") : [];
}
