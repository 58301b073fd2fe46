import { describe, expect, it } from "vitest";
import {
  fleschKincaidGrade,
  fleschKincaidGradeOfText,
  fleschReadingEase,
  fleschReadingEaseOfText,
  PLAIN_LANGUAGE_TARGET_GRADE,
  textCounts,
} from "@/lib/readability/flesch-kincaid";

// Formulas: Kincaid, Fishburne, Rogers & Chissom, Research Branch Report 8-75, 1975 (C2).
describe("Flesch–Kincaid from counts", () => {
  it("1 sentence, 13 words, 24 syllables → grade 11.26, ease 37.46 (calc; sentence from the encyclopedia article, C2)", () => {
    const counts = { sentences: 1, words: 13, syllables: 24 };
    expect(fleschKincaidGrade(counts)).toBeCloseTo(11.26, 2);
    expect(fleschReadingEase(counts)).toBeCloseTo(37.46, 2);
  });

  it('1 sentence, 6 words, 6 syllables ("The cat sat on the mat") → ease 116.145 (flesch npm README, C), grade −1.45 (calc)', () => {
    const counts = { sentences: 1, words: 6, syllables: 6 };
    expect(fleschReadingEase(counts)).toBeCloseTo(116.145, 9);
    expect(fleschKincaidGrade(counts)).toBeCloseTo(-1.45, 9);
  });

  it("refuses counts with no words or no sentences", () => {
    expect(() => fleschKincaidGrade({ words: 0, sentences: 0, syllables: 0 })).toThrow(RangeError);
  });
});

describe("Flesch–Kincaid from text (our syllable counter)", () => {
  it('"The cat sat on the mat." counts 1 / 6 / 6 and matches the README figures (C)', () => {
    expect(textCounts("The cat sat on the mat.")).toEqual({ sentences: 1, words: 6, syllables: 6 });
    expect(fleschReadingEaseOfText("The cat sat on the mat.")).toBeCloseTo(116.145, 9);
  });

  it("plain words grade below the EPA 2021 target and dense ones above it (sanity)", () => {
    const plain = "We open the windows every morning. Fresh air comes in. The fans run all day.";
    const dense =
      "Comprehensive mechanical ventilation improvements substantially increase the delivery of conditioned outdoor air throughout instructional environments, consequently diminishing airborne particulate concentrations.";
    expect(PLAIN_LANGUAGE_TARGET_GRADE).toBe(8);
    expect(fleschKincaidGradeOfText(plain)).toBeLessThan(PLAIN_LANGUAGE_TARGET_GRADE);
    expect(fleschKincaidGradeOfText(dense)).toBeGreaterThan(16);
    expect(fleschKincaidGradeOfText("")).toBeNull();
  });
});
