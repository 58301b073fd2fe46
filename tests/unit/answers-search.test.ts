import { beforeAll, describe, expect, it } from "vitest";
import { SEED_PUBLISHED_ANSWERS, SEED_SCHOOLS } from "@/db/seed-data";
import { loadContentFile } from "@/lib/content/files";
import { markdownToPlainText } from "@/lib/markdown/parse";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { buildSearchIndexPayload, createAnswerSearch, type AnswerSearch, type SearchIndexInput, type SearchIndexPayload, type SearchQuery } from "@/lib/answers/search";
import { loadContentSections, type PageSections } from "@/lib/answers/sections";
import { stem, termsOf, wordSpans } from "@/lib/answers/text";
import { DEFAULT_SEARCH_SYNONYMS } from "@/lib/settings/synonyms";

const TOPICS = Object.entries(TOPIC_LABELS).map(([code, label]) => ({ code, label }));
const SCHOOLS = SEED_SCHOOLS.map((s) => ({ slug: s.slug, name: s.name }));

// The seed inserts the answers in list order, so a fresh database numbers them 1, 2, 3…
const SEEDED = SEED_PUBLISHED_ANSWERS.map((a, i) => ({ ...a, id: i + 1 }));
const idOf = (question: string) => {
  const found = SEEDED.find((a) => a.question === question);
  if (!found) throw new Error(`no seeded answer asks "${question}"`);
  return found.id;
};

const AC = idOf("Do the classrooms at Tamsin Creek have air conditioning?");
const VENTILATION = idOf("What was done to the ventilation at Corrow Ridge, and how do you know it works?");
const FACE_COVERING = idOf("Does my child have to wear a face covering at school?");
const HAND_SANITIZER = idOf("Is there hand sanitizer in the classrooms, and is it safe for young children?");
const SPRAY = idOf("Do you spray disinfectant in classrooms while students are there?");
const PRODUCTS = idOf("What products do custodians use to disinfect classrooms, and are they safe for a child with asthma?");
const EASTMERE_GENERATOR = idOf("What will the emergency generator at Eastmere keep running if the power goes out?");
const CORROW_GENERATOR = idOf("Does the generator at Corrow Ridge keep the heat and the ventilation on in a power cut?");
const TAMSIN_POWER = idOf("What happens at Tamsin Creek if the power goes out? Is there a generator?");

let pages: PageSections[];
let payload: SearchIndexPayload;
let engine: AnswerSearch;

function seededInput(): SearchIndexInput {
  const newestFirst = [...SEEDED].sort((a, b) => b.publishedAt.localeCompare(a.publishedAt) || b.id - a.id);
  return {
    version: "test",
    schools: SCHOOLS,
    topics: TOPICS,
    synonyms: DEFAULT_SEARCH_SYNONYMS,
    answers: newestFirst.map((a) => ({
      id: a.id,
      question: a.question,
      school: a.school,
      topic: a.topic,
      day: a.publishedAt.slice(0, 10),
      text: markdownToPlainText(a.answer),
    })),
    pages,
  };
}

beforeAll(async () => {
  pages = await loadContentSections(SCHOOLS.map((s) => s.slug));
  payload = buildSearchIndexPayload(seededInput());
  engine = createAnswerSearch(payload);
});

const ids = (query: SearchQuery | string) => engine.search(typeof query === "string" ? { q: query } : query).answers.map((a) => a.id);
const first = (query: SearchQuery | string) => ids(query)[0];
const textOf = (id: number) => {
  const a = SEEDED.find((x) => x.id === id)!;
  return `${a.question}\n${a.answer}`.toLowerCase();
};

describe("search terms", () => {
  it("folds plurals with Harman's S-stemmer (JASIS 42(1), 1991, the three rules as published)", () => {
    expect(stem("masks")).toBe("mask");
    expect(stem("batteries")).toBe("battery");
    expect(stem("classes")).toBe("classe");
    expect(stem("glass")).toBe("glass");
    expect(stem("virus")).toBe("virus");
    expect(stem("shoes")).toBe("shoe");
    expect(stem("bus")).toBe("bus");
  });

  it("drops function words, folds accents and case, and writes hyphenated words solid as well", () => {
    expect(termsOf("Where do I wait at PICK-UP? Ventilación, MERV-13 filters")).toEqual(["wait", "pick", "pickup", "ventilacion", "merv", "13", "merv13", "filter"]);
  });

  it("keeps each word's place in the original text for highlighting", () => {
    const text = "Does the Généraţor's air-handler run?";
    const spans = wordSpans(text);
    expect(spans.map((s) => text.slice(s.start, s.end))).toEqual(["Does", "the", "Généraţor's", "air", "handler", "run"]);
    expect(spans[2]!.term).toBe("generator");
  });
});

describe("synonyms, both ways, on the demo district's answers", () => {
  it("AC and air conditioning find the Tamsin Creek air conditioning answer first", () => {
    expect(first("AC")).toBe(AC);
    expect(first("air conditioning")).toBe(AC);
    expect(first("is there AC in the classrooms")).toBe(AC);
    expect(textOf(AC)).not.toMatch(/\bac\b/);
  });

  it("HVAC and ventilation find the Corrow Ridge ventilation answer first", () => {
    expect(first("HVAC")).toBe(VENTILATION);
    expect(first("ventilation")).toBe(VENTILATION);
    expect(textOf(VENTILATION)).not.toMatch(/hvac/);
  });

  it("mask and face covering find the face covering answer first", () => {
    expect(first("mask")).toBe(FACE_COVERING);
    expect(first("face covering")).toBe(FACE_COVERING);
    expect(first("face coverings")).toBe(FACE_COVERING);
    expect(first("face mask")).toBe(FACE_COVERING);
    expect(textOf(FACE_COVERING)).not.toMatch(/mask/);
  });

  it("sanitizer and disinfectant each find their own answer first and the other's among the results", () => {
    expect(first("sanitizer")).toBe(HAND_SANITIZER);
    expect(first("sanitiser")).toBe(HAND_SANITIZER);
    expect(ids("sanitizer")).toEqual(expect.arrayContaining([SPRAY, PRODUCTS]));
    expect(first("disinfectant")).toBe(SPRAY);
    expect(ids("disinfectant")).toContain(HAND_SANITIZER);
  });

  it("the typed word outranks its synonym in the same place: a rarer synonym does not jump ahead", () => {
    const found = ids("disinfectant");
    expect(found.indexOf(SPRAY)).toBeLessThan(found.indexOf(HAND_SANITIZER));
  });
});

describe("synonyms, both ways, for every group of the default list", () => {
  // A small corpus where one answer uses only one member of a group: every other member must find it.
  for (const group of DEFAULT_SEARCH_SYNONYMS) {
    for (const written of group) {
      for (const typed of group) {
        if (typed === written) continue;
        it(`"${typed}" finds an answer that only says "${written}"`, () => {
          const corpus = createAnswerSearch(
            buildSearchIndexPayload({
              version: "pair",
              schools: SCHOOLS,
              topics: TOPICS,
              synonyms: DEFAULT_SEARCH_SYNONYMS,
              answers: [
                { id: 1, question: "When does the school day start?", school: null, topic: "other", day: "2026-11-20", text: "The first bell rings at 8:10." },
                { id: 2, question: `A question about the ${written} at Eastmere`, school: "eastmere", topic: "air", day: "2026-11-19", text: `The ${written} was checked.` },
                { id: 3, question: "Where do families wait at pick-up?", school: null, topic: "signs", day: "2026-11-18", text: "On the orange spots." },
              ],
              pages: [],
            }),
          );
          expect(corpus.search({ q: typed }).answers.map((a) => a.id)).toEqual([2]);
        });
      }
    }
  }

  it("a synonym the staff add works at once", () => {
    const corpus = createAnswerSearch(
      buildSearchIndexPayload({
        ...seededInput(),
        synonyms: [...DEFAULT_SEARCH_SYNONYMS, ["standby power", "emergency generator"]],
      }),
    );
    expect(engine.search({ q: "standby power" }).matchedAll).toBe(false);
    const found = corpus.search({ q: "standby power" });
    expect(found.matchedAll).toBe(true);
    expect(found.answers[0]!.id).toBe(EASTMERE_GENERATOR);
  });
});

describe("misspellings and partial words", () => {
  it("ventilaton finds the ventilation answer first", () => {
    expect(first("ventilaton")).toBe(VENTILATION);
  });

  it("copes with a swapped or wrong letter", () => {
    expect([EASTMERE_GENERATOR, CORROW_GENERATOR, TAMSIN_POWER]).toContain(first("generater"));
    expect(first("sanitzer")).toBe(HAND_SANITIZER);
    expect(first("disinfetcant")).toBe(SPRAY);
  });

  it("finds a word from its first letters, as a parent types", () => {
    expect(new Set(ids("genera").slice(0, 3))).toEqual(new Set([EASTMERE_GENERATOR, CORROW_GENERATOR, TAMSIN_POWER]));
    expect(first("hand sanit")).toBe(HAND_SANITIZER);
    expect(first("face cov")).toBe(FACE_COVERING);
  });

  it("marks the matched words, whole, in the question", () => {
    const hit = engine.search({ q: "genera" }).answers.find((a) => a.id === EASTMERE_GENERATOR)!;
    expect(hit.question.marks.map(([s, e]) => hit.question.text.slice(s, e))).toEqual(["generator"]);
    const ac = engine.search({ q: "AC" }).answers[0]!;
    expect(ac.question.marks.map(([s, e]) => ac.question.text.slice(s, e))).toEqual(["air", "conditioning"]);
  });
});

describe("filters and ranking", () => {
  it("lists every answer newest first when there is nothing to search for", () => {
    const all = engine.search({});
    const newestFirst = [...SEEDED].sort((a, b) => b.publishedAt.localeCompare(a.publishedAt) || b.id - a.id).map((a) => a.id);
    expect(all.answers.map((a) => a.id)).toEqual(newestFirst);
    expect(all.searched).toBe(false);
    expect(all.sections).toEqual([]);
    // Only function words: nothing to search for either.
    expect(engine.search({ q: "what is the" }).answers.map((a) => a.id)).toEqual(newestFirst);
  });

  it("combines school and topic: that school's answers and those for every school, on that topic", () => {
    const found = engine.search({ school: "eastmere", topic: "building" }).answers;
    expect(found.length).toBeGreaterThan(0);
    for (const a of found) {
      expect(a.topic).toBe("building");
      expect(["eastmere", "district"]).toContain(a.school);
    }
    expect(found.map((a) => a.id)).toContain(EASTMERE_GENERATOR);
    expect(found.map((a) => a.id)).not.toContain(CORROW_GENERATOR);

    expect(ids({ q: "generator", school: "corrow-ridge", topic: "building" })).toEqual([CORROW_GENERATOR]);
    expect(ids({ q: "generator", school: "corrow-ridge", topic: "cleaning" })).toEqual([]);
    for (const a of engine.search({ school: "district" }).answers) expect(a.school).toBe("district");
  });

  it("ignores a school or topic it does not know instead of hiding everything", () => {
    expect(ids({ q: "generator", school: "nowhere" })).toEqual(ids("generator"));
    expect(engine.search({ school: "nowhere", topic: "nothing" }).query).toMatchObject({ school: "", topic: "" });
  });

  it("needs every word; when no answer has them all, shows those with the most and says so", () => {
    expect(ids("generator eastmere")[0]).toBe(EASTMERE_GENERATOR);
    expect(ids("generator eastmere")).not.toContain(TAMSIN_POWER);
    const partial = engine.search({ q: "generator unicorns" });
    expect(partial.matchedAll).toBe(false);
    expect(partial.answers.map((a) => a.id)).toEqual(expect.arrayContaining([EASTMERE_GENERATOR, CORROW_GENERATOR, TAMSIN_POWER]));
    expect(engine.search({ q: "unicorns" }).answers).toEqual([]);
  });

  it("gives the same results from the index as sent over the wire (the browser's copy)", () => {
    const copy = createAnswerSearch(JSON.parse(JSON.stringify(payload)) as SearchIndexPayload);
    for (const q of ["AC", "ventilaton", "generator power", "hand sanit", "wait here", "face covering", "800 ppm"]) {
      for (const filters of [{}, { school: "eastmere" }, { topic: "air" }, { school: "district", topic: "cleaning" }]) {
        expect(copy.search({ q, ...filters })).toEqual(engine.search({ q, ...filters }));
      }
    }
  });

  it("offers related answers on the same subject", () => {
    const related = engine.related(EASTMERE_GENERATOR).map((a) => a.id);
    expect(related.length).toBeGreaterThan(0);
    expect(related).not.toContain(EASTMERE_GENERATOR);
    expect([CORROW_GENERATOR, TAMSIN_POWER]).toContain(related[0]);
    expect(engine.related(99_999)).toEqual([]);
  });
});

describe("sections of the MDX pages", () => {
  it("finds the Building work section that explains the generator", () => {
    const result = engine.search({ q: "generator" });
    const urls = result.sections.map((s) => s.url);
    expect(urls).toContain("/schools/eastmere/building#an-emergency-generator");
    expect(urls).toContain("/schools/corrow-ridge/building#a-new-emergency-generator");
    expect(result.sections[0]!.heading.text).toMatch(/generator/i);
    expect(result.sections[0]!.url).toMatch(/^\/schools\/[a-z-]+\/building#/);
  });

  it("keeps a school's filter: Eastmere's search shows Eastmere's pages and the district's, not another school's", () => {
    const urls = engine.search({ q: "generator", school: "eastmere" }).sections.map((s) => s.url);
    expect(urls).toContain("/schools/eastmere/building#an-emergency-generator");
    expect(urls.every((u) => u.startsWith("/schools/eastmere/") || u.startsWith("/district/"))).toBe(true);
  });

  it("links to the ids the page renderer gives its headings", async () => {
    for (const page of pages) {
      const file = page.url.startsWith("/district/") ? `district/${page.url.slice("/district/".length)}.mdx` : `schools/${page.url.slice("/schools/".length)}.mdx`;
      const content = await loadContentFile(file);
      const rendered = new Set(content.headings.map((h) => h.id));
      for (const s of page.sections) if (s.anchor) expect(rendered, `${page.url}#${s.anchor}`).toContain(s.anchor);
    }
  });
});

describe("the highlight's colours", () => {
  it("meet WCAG 2.1 AA contrast (4.5:1, SC 1.4.3): deep harbour on harbour soft, as components/answers/highlighted.tsx uses them", async () => {
    const { contrastRatio } = await import("@/lib/contrast");
    const config = (await import("@/tailwind.config")).default;
    const colors = config.theme!.extend!.colors as Record<string, Record<string, string>>;
    expect(contrastRatio(colors.harbour!.deep!, colors.harbour!.soft!)).toBeGreaterThanOrEqual(4.5);
  });
});
