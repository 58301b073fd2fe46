import { describe, expect, it } from "vitest";
import { countSyllables, hardestSentence, splitSentences, splitWords, textCounts } from "@/lib/readability/flesch-kincaid";

describe("syllable heuristic", () => {
  it.each([
    ["the", 1],
    ["air", 1],
    ["make", 1],
    ["table", 2],
    ["people", 2],
    ["classes", 2],
    ["times", 1],
    ["cleaned", 1],
    ["wanted", 2],
    ["played", 1],
    ["radio", 3],
    ["ventilation", 4],
    ["conditioning", 4],
    ["disinfectant", 4],
    ["one-way", 2],
    ["6", 1],
  ] as const)("%s has %i", (word, syllables) => {
    expect(countSyllables(word)).toBe(syllables);
  });
});

describe("words and sentences", () => {
  it("does not split after titles, e.g. or a time followed by a lower-case word", () => {
    expect(splitSentences("Dr. Ortiz checked the fans. Doors open at 8 a.m. and close at 3 p.m. Buses leave at 3:15.")).toEqual([
      "Dr. Ortiz checked the fans.",
      "Doors open at 8 a.m. and close at 3 p.m.",
      "Buses leave at 3:15.",
    ]);
  });

  it("treats blank lines and list items as sentence breaks", () => {
    expect(splitSentences("Fresh air\n\nWhat we do:\n- open windows\n- run the fans")).toEqual(["Fresh air", "What we do:", "- open windows", "- run the fans"]);
  });

  it("drops link targets and addresses before counting", () => {
    expect(splitWords("See [the air page](https://example.org/schools/air) or write to desk@example.org.")).toEqual(["See", "the", "air", "page", "or", "write", "to"]);
  });

  it("counts an empty text as nothing", () => {
    expect(textCounts("  ")).toEqual({ words: 0, sentences: 0, syllables: 0 });
  });
});

describe("hardest sentence", () => {
  it("finds the sentence with the highest grade", () => {
    const text =
      "We clean desks every day. Comprehensive mechanical ventilation improvements substantially increase outdoor air delivery. Ask us anything.";
    const hardest = hardestSentence(text);
    expect(hardest?.sentence).toBe("Comprehensive mechanical ventilation improvements substantially increase outdoor air delivery.");
    expect(hardest?.words).toBe(9);
    expect(hardest?.grade).toBeGreaterThan(15);
  });

  it("returns null for text without words", () => {
    expect(hardestSentence("")).toBeNull();
    expect(hardestSentence("— …")).toBeNull();
  });
});
