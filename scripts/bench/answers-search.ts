// The answers search as a parent types: generated published answers (2,000 and 10,000) plus the
// demo's content sections go through the same index builder and search engine the browser
// runs, then a set of queries is typed one letter at a time. Prints, per size: the index sent
// to the browser (raw and gzipped), the time to build the engine from it, and the search time
// per keystroke (median and 95th percentile over five fresh engines, the first with a cold
// JIT), the page's first 50 answers and 6 sections highlighted. Targets on the 2-core reference machine, at
// 2,000 answers: under 16 ms per keystroke, index under 150 kB gzipped.
import { gzipSync } from "node:zlib";
import { SEED_PUBLISHED_ANSWERS, SEED_SCHOOLS } from "@/db/seed-data";
import { buildSearchIndexPayload, createAnswerSearch, type SearchIndexInput } from "@/lib/answers/search";
import { loadContentSections } from "@/lib/answers/sections";
import { markdownToPlainText } from "@/lib/markdown/parse";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { DEFAULT_SEARCH_SYNONYMS } from "@/lib/settings/synonyms";
import { percentile } from "./lib/stats";

const SIZES = (process.env.BENCH_ANSWER_SIZES ?? "2000,10000").split(",").map(Number);
/** What the page asks for per keystroke: the first 50 answers and 6 sections, highlighted. */
const PAGE = { answerLimit: 50, sectionLimit: 6 };
const ROUNDS = Number(process.env.BENCH_ANSWER_ROUNDS ?? 5);
const QUERIES = [
  "is there air conditioning in the gym",
  "ventilaton in classrooms",
  "HVAC filters",
  "generator power cut",
  "hand sanitizer",
  "face covering on the bus",
  "what disinfectant do custodians use",
  "wait here spots at pick-up",
  "how far apart are desks",
  "co2 sensor 800 ppm",
];

// A seeded random sequence, so every run generates the same answers.
function random(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

// Invented school names (Wrenmoor Valley is invented, and so are these): syllables joined.
const FIRST = ["Tam", "Cor", "East", "Wren", "Mar", "Hol", "Bry", "Kel", "Fen", "Ast", "Quil", "Dun", "Ser", "Olm", "Pell", "Vark"];
const SECOND = ["sin", "row", "mere", "by", "ford", "ley", "wick", "dale", "ton", "hurst", "brook", "more"];
const KIND = ["Elementary", "Middle School", "High School"];
const PLACES = ["the gym", "the library", "the cafeteria", "the music rooms", "the science labs", "the portable classrooms", "the main office", "the art room", "the nurse's office", "the auditorium"];
const WHEN = ["in the mornings", "on hot days", "during testing week", "after the storm", "on early-release days", "in winter", "at lunch", "during after-school clubs", "on field trip days", "at drop-off"];

interface Generated {
  schools: { slug: string; name: string }[];
  answers: SearchIndexInput["answers"];
}

function sentencesOf(text: string): string[] {
  return text.split(/(?<=[.!?])\s+/).filter((s) => s.length > 20);
}

/** Answers written from the demo's own sentences, re-mixed per school, place and time, with room numbers and figures varied. */
function generate(count: number, pageTexts: string[]): Generated {
  const rnd = random(count);
  const pick = <T,>(list: readonly T[]): T => list[Math.floor(rnd() * list.length)]!;
  const schools = Array.from({ length: 60 }, (_, i) => {
    const name = `${FIRST[i % FIRST.length]}${SECOND[(i * 7) % SECOND.length]} ${KIND[i % 3]}`;
    return { slug: name.toLowerCase().replace(/[^a-z]+/g, "-"), name };
  });
  const seeds = SEED_PUBLISHED_ANSWERS.map((a) => ({ ...a, sentences: sentencesOf(markdownToPlainText(a.answer)) }));
  const byTopic = new Map<string, string[]>();
  for (const s of seeds) byTopic.set(s.topic, [...(byTopic.get(s.topic) ?? []), ...s.sentences]);
  const pageSentences = pageTexts.flatMap(sentencesOf);
  const answers: Generated["answers"] = [];
  for (let i = 0; i < count; i += 1) {
    const seed = seeds[i % seeds.length]!;
    const school = rnd() < 0.3 ? null : pick(schools);
    const place = pick(PLACES);
    const room = `Room ${100 + Math.floor(rnd() * 300)}`;
    const question = `${seed.question.replace(/\?$/, "")} in ${place} ${pick(WHEN)}${school ? ` at ${school.name}` : ""}?`;
    const pool = byTopic.get(seed.topic) ?? seed.sentences;
    const body = [
      ...seed.sentences.filter(() => rnd() < 0.6),
      ...Array.from({ length: 2 + Math.floor(rnd() * 3) }, () => pick(pool)),
      pick(pageSentences),
      `In ${room}, ${place.replace(/^the /, "the ")} staff check this ${pick(WHEN)}.`,
    ]
      .map((s) => s.replace(/\b\d{2,4}\b/g, () => String(10 + Math.floor(rnd() * 990))))
      .join(" ");
    const day = new Date(Date.UTC(2026, 0, 1) + Math.floor((i / count) * 330) * 86_400_000).toISOString().slice(0, 10);
    answers.push({ id: i + 1, question, school: school?.slug ?? null, topic: seed.topic, day, text: body });
  }
  answers.reverse(); // newest first, as the index expects
  return { schools, answers };
}

async function main(): Promise<void> {
  const pages = await loadContentSections(SEED_SCHOOLS.map((s) => s.slug));
  const pageTexts = pages.flatMap((p) => p.sections.map((s) => s.text));
  console.log(`queries typed letter by letter: ${QUERIES.length}, ${QUERIES.reduce((n, q) => n + q.length, 0)} keystrokes per size`);
  for (const size of SIZES) {
    const generated = generate(size, pageTexts);
    const payload = buildSearchIndexPayload({
      version: `bench-${size}`,
      schools: [...SEED_SCHOOLS.map((s) => ({ slug: s.slug, name: s.name })), ...generated.schools],
      topics: Object.entries(TOPIC_LABELS).map(([code, label]) => ({ code, label })),
      synonyms: DEFAULT_SEARCH_SYNONYMS,
      answers: generated.answers,
      pages,
    });
    const json = JSON.stringify(payload);
    const rawKb = Buffer.byteLength(json) / 1000;
    const gzKb = gzipSync(json).length / 1000;
    const fullText = generated.answers.reduce((n, a) => n + a.question.length + a.text.length, 0) / 1000;

    // As the browser does: parse the index, build the engine, then type. Each round is a fresh
    // engine (a new page load: nothing cached); the first round also pays for a cold JIT.
    const times: number[] = [];
    const builds: number[] = [];
    let matched = 0;
    for (let round = 0; round < ROUNDS; round += 1) {
      let started = performance.now();
      const engine = createAnswerSearch(JSON.parse(json));
      builds.push(performance.now() - started);
      for (const query of QUERIES) {
        for (let k = 1; k <= query.length; k += 1) {
          started = performance.now();
          const result = engine.search({ q: query.slice(0, k) }, PAGE);
          times.push(performance.now() - started);
          if (round === 0) matched += result.totalAnswers;
        }
      }
    }
    builds.sort((a, b) => a - b);
    const buildMs = builds[builds.length >> 1]!;
    const firstBuildMs = builds[builds.length - 1]!;
    times.sort((a, b) => a - b);
    const median = percentile(times, 0.5);
    const p95 = percentile(times, 0.95);
    const max = times[times.length - 1]!;
    console.log(`\n${size.toLocaleString("en-US")} answers (${fullText.toFixed(0)} kB of question and answer text) + ${payload.sections.length} page sections`);
    console.log(`  index sent to the browser: ${rawKb.toFixed(1)} kB raw, ${gzKb.toFixed(1)} kB gzipped (${((gzKb * 1000) / size).toFixed(0)} bytes an answer)`);
    console.log(`  engine built from it in ${buildMs.toFixed(0)} ms (median; slowest ${firstBuildMs.toFixed(0)} ms)`);
    console.log(`  per keystroke: median ${median.toFixed(2)} ms, p95 ${p95.toFixed(2)} ms, slowest ${max.toFixed(2)} ms (${times.length} keystrokes over ${ROUNDS} fresh page loads; ${matched.toLocaleString("en-US")} answers matched per round)`);
    if (size === 2000) {
      console.log(`  targets at 2,000: < 16 ms per keystroke (p95) ${p95 < 16 ? "met" : "MISSED"}; < 150 kB gzipped ${gzKb < 150 ? "met" : "MISSED"}`);
    }
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
