import type { DB } from "./connection";
import type { SeedQuestion } from "./seed-data";

// More invented questions for the desk's demo (filters, paging, a near-duplicate to join) and the
// reply snippets the communications team starts with.

export const SEED_DESK_QUESTIONS: SeedQuestion[] = [
  {
    reference: "Q-2026-0007",
    school: "tamsin-creek",
    topic: "air",
    room: "Room 104",
    body: "Is fresh outside air coming into Room 104? The windows are shut whenever I pick up and the room feels stuffy after lunch.",
    askerName: "Teodor Vance",
    askerEmail: "t.vance@example.net",
    language: "en",
    receivedAt: "2026-11-26T15:10:00.000Z",
  },
  {
    reference: "Q-2026-0008",
    school: "eastmere",
    topic: "building",
    room: null,
    body: "When will the work at the front entrance be finished? The fencing makes the morning drop-off very slow.",
    askerName: "Priya Calloway",
    askerEmail: "p.calloway@example.net",
    language: "en",
    receivedAt: "2026-11-27T12:30:00.000Z",
  },
  {
    reference: "Q-2026-0009",
    school: "corrow-ridge",
    topic: "air",
    room: "Portable 2",
    body: "Will the air conditioning run in the portable classrooms on warm days, and are its filters changed?",
    askerName: null,
    askerEmail: "d.mbeki-hart@example.net",
    language: "en",
    receivedAt: "2026-11-29T18:45:00.000Z",
  },
  {
    reference: "Q-2026-0010",
    school: null,
    topic: "other",
    room: null,
    body: "Will the buses keep their normal times from the first day back, or are there new stops?",
    askerName: "Lena Strand",
    askerEmail: "lena.strand@example.net",
    language: "en",
    receivedAt: "2026-11-30T10:05:00.000Z",
  },
  {
    reference: "Q-2026-0011",
    school: "tamsin-creek",
    topic: "cleaning",
    room: null,
    body: "How often are the bathrooms cleaned during the day, and what is wiped on the door handles?",
    askerName: "Omar Fielding",
    askerEmail: "omar.fielding@example.net",
    language: "en",
    receivedAt: "2026-11-30T13:20:00.000Z",
  },
  {
    reference: "Q-2026-0012",
    school: "eastmere",
    topic: "distancing",
    room: null,
    body: "Is lunch still in the cafeteria, or will the children eat in their classrooms?",
    askerName: null,
    askerEmail: "k.osei@example.net",
    language: "en",
    receivedAt: "2026-12-01T06:55:00.000Z",
  },
  {
    reference: "Q-2026-0013",
    school: "corrow-ridge",
    topic: "signs",
    room: null,
    body: "My son uses a wheelchair. With the one-way hallways, can he still take the lift by the library between classes?",
    askerName: "Greta Hollins",
    askerEmail: "greta.hollins@example.net",
    language: "en",
    receivedAt: "2026-12-01T08:40:00.000Z",
  },
];

export interface SeedSnippet {
  title: string;
  bodyMarkdown: string;
}

export const SEED_SNIPPETS: SeedSnippet[] = [
  {
    title: "A child's own health: the school nurse",
    bodyMarkdown:
      "Questions about your own child's health are best answered by the school nurse, who can talk with you in private. If your child is sick now, please call the nurse or your doctor. In an emergency, call 911. Decisions about quarantine are made by the local health department.",
  },
  {
    title: "How we check outdoor air",
    bodyMarkdown:
      "Our facilities team checks the outdoor air setting of every classroom's ventilation unit against the design figures before the building opens, and again each month. You can see each room's figures on your school's air page.",
  },
  {
    title: "Closing: thank you",
    bodyMarkdown: "Thank you for asking. If anything is still unclear, send us a follow-up through the question form and give your reference.",
  },
];

/** Adds the starting snippets once; a snippet with the same title is left as staff edited it. */
export async function seedSnippets(db: DB, at: string): Promise<void> {
  for (const s of SEED_SNIPPETS) {
    const exists = await db.selectFrom("reply_snippets").select("id").where("title", "=", s.title).executeTakeFirst();
    if (exists) continue;
    await db.insertInto("reply_snippets").values({ title: s.title, body_markdown: s.bodyMarkdown, updated_at: at }).execute();
  }
}
