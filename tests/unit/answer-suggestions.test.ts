import { describe, expect, it } from "vitest";
import { SEED_PUBLISHED_ANSWERS } from "@/db/seed-data";
import type { AnswerSuggestion } from "@/lib/answers/repository";
import { createSuggestionIndex, MAX_SUGGESTIONS, significantWords } from "@/lib/answers/suggest";
import { markdownExcerpt } from "@/lib/markdown/parse";

const answers: AnswerSuggestion[] = SEED_PUBLISHED_ANSWERS.map((a, i) => ({
  id: i + 1,
  question: a.question,
  school: a.school ?? "district",
  schoolName: a.school ?? "All schools",
  topic: a.topic,
  topicLabel: a.topic,
  excerpt: markdownExcerpt(a.answer),
  url: `/answers/${i + 1}`,
}));
const index = createSuggestionIndex(answers);
const questions = (q: string, school?: string) => index.suggest(q, school).map((a) => a.question);

describe("significantWords", () => {
  it("drops the words every question has and spells out short forms", () => {
    expect(significantWords("Is there AC in my son's classroom?")).toEqual(["air", "conditioning", "classroom"]);
    expect(significantWords("HVAC")).toEqual(["ventilation", "air"]);
  });
});

describe("suggestions while a parent types", () => {
  it("finds the published answer to the same question, in the parent's own words", () => {
    const found = questions(
      "Does my son's classroom get fresh air from outside, or is the same air just going round? The windows always look closed.",
      "tamsin-creek",
    );
    expect(found[0]).toBe("Does my child's classroom at Tamsin Creek get fresh air from outside, or does the same air just go round?");
  });

  it("copes with short forms and misspellings", () => {
    expect(questions("is there AC in the classrooms", "tamsin-creek")[0]).toBe("Do the classrooms at Tamsin Creek have air conditioning?");
    expect(questions("what happens if the power goes out, is there a generater", "eastmere")[0]).toBe(
      "What will the emergency generator at Eastmere keep running if the power goes out?",
    );
  });

  it("keeps to the chosen school and the district-wide answers", () => {
    const found = index.suggest("what happens if the power goes out, is there a generator", "corrow-ridge");
    expect(found.map((a) => a.school).every((s) => s === "corrow-ridge" || s === "district")).toBe(true);
    const everywhere = index.suggest("what happens if the power goes out, is there a generator", "district");
    expect(new Set(everywhere.map((a) => a.school)).size).toBeGreaterThan(1);
  });

  it("offers at most three, and nothing for an unrelated question or a few words", () => {
    expect(index.suggest("fresh air in the classroom windows and ventilation").length).toBeLessThanOrEqual(MAX_SUGGESTIONS);
    expect(index.suggest("When is the school play this year?")).toEqual([]);
    expect(index.suggest("Is the bus schedule changing for the middle school?")).toEqual([]);
    expect(index.suggest("generator")).toEqual([]);
    expect(createSuggestionIndex([]).suggest("fresh air from outside in the classroom")).toEqual([]);
  });
});
