import { describe, expect, it } from "vitest";
import { fieldErrors } from "@/lib/validation/field-errors";
import { addSynonymGroup, parseSynonymWords, removeSynonymGroup, replaceSynonymGroup, SynonymListError } from "@/lib/settings/synonym-groups";
import { DEFAULT_SEARCH_SYNONYMS } from "@/lib/settings/synonyms";
import { holidayAddSchema, holidayRemoveSchema, replySettingsSchema } from "@/lib/validation/calendar-settings";
import { synonymGroupAddSchema, synonymGroupEditSchema } from "@/lib/validation/synonyms";

const errorsOf = (result: { success: boolean; error?: unknown }) =>
  result.success ? {} : fieldErrors(result.error as Parameters<typeof fieldErrors>[0]);

describe("holidayAddSchema", () => {
  it("expands a break to its weekdays and keeps the name", () => {
    const parsed = holidayAddSchema.parse({ from: " 2026-12-21 ", to: "2027-01-01", name: " Winter break " });
    expect(parsed).toMatchObject({ from: "2026-12-21", to: "2027-01-01", name: "Winter break" });
    expect(parsed.dates).toHaveLength(10);
    expect(holidayAddSchema.parse({ from: "2026-11-26", to: "", name: "" })).toEqual({ from: "2026-11-26", to: "2026-11-26", name: null, dates: ["2026-11-26"] });
  });

  it("refuses bad input with a message by the field", () => {
    expect(errorsOf(holidayAddSchema.safeParse({ from: "", to: "", name: "" }))).toEqual({ from: "Enter the first day, like 2026-12-21." });
    expect(errorsOf(holidayAddSchema.safeParse({ from: "2026-02-30", to: "", name: "" }))).toEqual({ from: "2026-02-30 is not a date: February 2026 has 28 days." });
    expect(errorsOf(holidayAddSchema.safeParse({ from: "2026-12-21", to: "2026-12-18", name: "" }))).toEqual({
      to: "The last day, Friday, December 18, 2026, is before the first day, Monday, December 21, 2026.",
    });
    expect(errorsOf(holidayAddSchema.safeParse({ from: "2026-12-19", to: "", name: "" })).from).toBe(
      "Saturday, December 19, 2026 is a weekend day. Weekends are never school days, so there is nothing to add.",
    );
    expect(errorsOf(holidayAddSchema.safeParse({ from: "2026-12-21", to: "", name: "x".repeat(61) })).name).toMatch(/under 60/);
    expect(errorsOf(holidayAddSchema.safeParse({ from: "2026-12-21", to: "", name: "tab\there" })).name).toBeDefined();
    expect(holidayAddSchema.safeParse({ from: 20261221 }).success).toBe(false);
  });
});

describe("holidayRemoveSchema", () => {
  it("needs at least one real date", () => {
    expect(holidayRemoveSchema.safeParse({ dates: ["2026-12-21"] }).success).toBe(true);
    expect(errorsOf(holidayRemoveSchema.safeParse({ dates: [] })).dates).toBe("Tick at least one day to remove.");
    expect(holidayRemoveSchema.safeParse({ dates: ["2026-02-30"] }).success).toBe(false);
    expect(holidayRemoveSchema.safeParse({}).success).toBe(false);
  });
});

describe("replySettingsSchema", () => {
  it("takes 0 to 60 school days and a canonical IANA zone", () => {
    expect(replySettingsSchema.parse({ replyTargetSchoolDays: "0", timeZone: "America/Chicago" })).toEqual({ replyTargetSchoolDays: 0, timeZone: "America/Chicago" });
    expect(replySettingsSchema.parse({ replyTargetSchoolDays: " 60 ", timeZone: "us/eastern" })).toEqual({ replyTargetSchoolDays: 60, timeZone: "America/New_York" });
  });

  it("refuses 99, fractions, negatives and unknown zones", () => {
    const message = "Enter a whole number of school days from 0 to 60.";
    for (const value of ["99", "61", "2.5", "-1", "", "three"]) {
      expect(errorsOf(replySettingsSchema.safeParse({ replyTargetSchoolDays: value, timeZone: "America/New_York" })).replyTargetSchoolDays, value).toBe(message);
    }
    expect(errorsOf(replySettingsSchema.safeParse({ replyTargetSchoolDays: "3", timeZone: "Wrenmoor/Valley" })).timeZone).toMatch(/not a time zone name/);
    expect(replySettingsSchema.safeParse({ replyTargetSchoolDays: 3, timeZone: "UTC" }).success).toBe(false);
  });
});

describe("synonym groups", () => {
  it("reads comma-separated words: trimmed, lower case, no repeats", () => {
    expect(parseSynonymWords(" Bus, school   Bus,,BUS , ")).toEqual(["bus", "school bus"]);
    expect(synonymGroupAddSchema.parse({ words: "Nurse, health office" })).toEqual({ words: ["nurse", "health office"] });
  });

  it("names the word that is wrong", () => {
    expect(errorsOf(synonymGroupAddSchema.safeParse({ words: "bus" })).words).toBe("A group needs at least two words.");
    expect(errorsOf(synonymGroupAddSchema.safeParse({ words: "bus, b" })).words).toBe("“b”: a word must be at least 2 letters.");
    expect(errorsOf(synonymGroupAddSchema.safeParse({ words: "bus, <script>" })).words).toMatch(/^“<script>”: use letters/);
    expect(synonymGroupEditSchema.safeParse({ original: [], words: "a1, b2" }).success).toBe(false);
  });

  it("adds, changes and removes groups, and refuses a word already in another group", () => {
    const added = addSynonymGroup(DEFAULT_SEARCH_SYNONYMS, ["bus", "school bus"]);
    expect(added).toHaveLength(DEFAULT_SEARCH_SYNONYMS.length + 1);
    expect(added.at(-1)).toEqual(["bus", "school bus"]);
    expect(() => addSynonymGroup(added, ["cooling", "chiller"])).toThrow(SynonymListError);
    expect(() => addSynonymGroup(added, ["cooling", "chiller"])).toThrow("“cooling” is already in the group “ac, air conditioning, air conditioner, cooling”");

    const changed = replaceSynonymGroup(added, ["school bus", "bus"], ["bus", "school bus", "transportation"]);
    expect(changed.at(-1)).toEqual(["bus", "school bus", "transportation"]);
    // A group may keep its own words when it is changed.
    expect(replaceSynonymGroup(changed, ["bus", "school bus", "transportation"], ["bus", "transportation"]).at(-1)).toEqual(["bus", "transportation"]);

    expect(removeSynonymGroup(changed, ["bus", "school bus", "transportation"])).toEqual(DEFAULT_SEARCH_SYNONYMS);
    expect(() => removeSynonymGroup(changed, ["no", "such group"])).toThrow(/no longer on the list/);
    // The defaults themselves are untouched.
    expect(DEFAULT_SEARCH_SYNONYMS).toHaveLength(4);
  });
});
