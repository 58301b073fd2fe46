import { hashPassword } from "@/lib/auth/password";
import { isTechnicalTopic } from "@/lib/questions/state-machine";
import type { DB } from "./connection";
import { seedRoomAir } from "./seed-air";
import { seedCo2 } from "./seed-co2";
import { SEED_DESK_QUESTIONS, seedSnippets } from "./seed-desk";
import {
  DEMO_PASSWORD,
  SEED_PROJECTS,
  SEED_PUBLISHED_ANSWERS,
  SEED_QUESTIONS,
  SEED_SCHOOLS,
  SEED_SETTINGS,
  SEED_USERS,
} from "./seed-data";

/** Seeded rows carry a fixed time, so running the seed again changes nothing. */
const SEEDED_AT = "2026-11-01T12:00:00.000Z";

export interface SeedSummary {
  schools: number;
  rooms: number;
  users: number;
  questions: number;
  publishedAnswers: number;
}

/**
 * Loads the invented demo district. Idempotent: every row is keyed by a natural
 * key (slug, room name, e-mail, reference) and only inserted when missing, so a
 * second run adds nothing and never overwrites what staff changed since.
 */
export async function seed(db: DB): Promise<SeedSummary> {
  const passwordHashes = new Map<string, string>();
  const existingUsers = new Set(
    (await db.selectFrom("users").select("email").execute()).map((u) => u.email),
  );
  for (const user of SEED_USERS) {
    // Hash outside the transaction: argon2 is slow on purpose and SQLite has one writer.
    if (!existingUsers.has(user.email)) passwordHashes.set(user.email, await hashPassword(DEMO_PASSWORD));
  }

  await db.transaction().execute(async (trx) => {
    for (const school of SEED_SCHOOLS) {
      await trx
        .insertInto("schools")
        .values({
          slug: school.slug,
          name: school.name,
          level: school.level,
          grades: school.grades,
          address: school.address,
          phone: school.phone,
          created_at: SEEDED_AT,
        })
        .onConflict((oc) => oc.column("slug").doNothing())
        .execute();
      const { id: schoolId } = await trx
        .selectFrom("schools")
        .select("id")
        .where("slug", "=", school.slug)
        .executeTakeFirstOrThrow();
      for (const room of school.rooms) {
        const air = seedRoomAir(school.slug, room.name);
        const airColumns = {
          outdoor_air_cfm: air.outdoorAirCfm,
          air_cleaners: air.airCleaners,
          cadr_cfm_each: air.cadrCfmEach,
          merv: air.merv,
          windows_open: air.windowsOpen ? 1 : 0,
        };
        await trx
          .insertInto("rooms")
          .values({
            school_id: schoolId,
            name: room.name,
            use: room.use,
            length_ft: room.lengthFt,
            width_ft: room.widthFt,
            ceiling_ft: room.ceilingFt,
            occupancy: room.occupancy,
            ...airColumns,
            created_at: SEEDED_AT,
            updated_at: SEEDED_AT,
          })
          // A room seeded before it had air figures gets them; one staff have edited since is left alone.
          .onConflict((oc) => oc.columns(["school_id", "name"]).doUpdateSet(airColumns).where("rooms.updated_at", "=", SEEDED_AT))
          .execute();
      }
    }

    for (const user of SEED_USERS) {
      const passwordHash = passwordHashes.get(user.email);
      if (!passwordHash) continue;
      await trx
        .insertInto("users")
        .values({
          email: user.email,
          name: user.name,
          role: user.role,
          password_hash: passwordHash,
          created_at: SEEDED_AT,
          updated_at: SEEDED_AT,
        })
        .onConflict((oc) => oc.column("email").doNothing())
        .execute();
    }

    for (const q of [...SEED_QUESTIONS, ...SEED_DESK_QUESTIONS]) {
      const school = q.school
        ? await trx.selectFrom("schools").select("id").where("slug", "=", q.school).executeTakeFirstOrThrow()
        : null;
      const inserted = await trx
        .insertInto("questions")
        .values({
          reference: q.reference,
          school_id: school?.id ?? null,
          topic: q.topic,
          room: q.room,
          body: q.body,
          asker_name: q.askerName,
          asker_email: q.askerEmail,
          language: q.language,
          state: "received",
          technical: isTechnicalTopic(q.topic) ? 1 : 0,
          created_at: q.receivedAt,
          updated_at: q.receivedAt,
        })
        .onConflict((oc) => oc.column("reference").doNothing())
        .returning("id")
        .executeTakeFirst();
      if (inserted) {
        await trx
          .insertInto("question_events")
          .values({
            question_id: inserted.id,
            kind: "received",
            to_state: "received",
            detail: JSON.stringify({ via: "seed" }),
            created_at: q.receivedAt,
          })
          .execute();
      }
    }

    for (const [index, p] of SEED_PROJECTS.entries()) {
      const school = await trx.selectFrom("schools").select("id").where("slug", "=", p.school).executeTakeFirstOrThrow();
      await trx
        .insertInto("building_projects")
        .values({
          school_id: school.id,
          key: p.key,
          title: p.title,
          kind: p.kind,
          summary: p.summary,
          status: p.status,
          status_date: p.statusDate,
          sort_order: index,
          updated_at: SEEDED_AT,
        })
        .onConflict((oc) => oc.columns(["school_id", "key"]).doNothing())
        .execute();
    }

    // Published answers have no natural key column; the public wording of the question serves as one.
    const publisher = await trx.selectFrom("users").select("id").where("role", "=", "communications").orderBy("id").executeTakeFirst();
    for (const a of SEED_PUBLISHED_ANSWERS) {
      const exists = await trx.selectFrom("published_answers").select("id").where("question_text", "=", a.question).executeTakeFirst();
      if (exists) continue;
      const school = a.school
        ? await trx.selectFrom("schools").select("id").where("slug", "=", a.school).executeTakeFirstOrThrow()
        : null;
      await trx
        .insertInto("published_answers")
        .values({
          school_id: school?.id ?? null,
          topic: a.topic,
          question_text: a.question,
          answer_markdown: a.answer,
          published_at: a.publishedAt,
          published_by: publisher?.id ?? null,
          updated_at: a.publishedAt,
        })
        .execute();
    }

    for (const [key, value] of Object.entries(SEED_SETTINGS)) {
      await trx
        .insertInto("settings")
        .values({ key, value: JSON.stringify(value), updated_at: SEEDED_AT })
        .onConflict((oc) => oc.column("key").doNothing())
        .execute();
    }
  });

  await seedCo2(db);
  await seedSnippets(db, SEEDED_AT);

  const count = async (table: "schools" | "rooms" | "users" | "questions" | "published_answers") =>
    Number((await db.selectFrom(table).select((eb) => eb.fn.countAll().as("n")).executeTakeFirstOrThrow()).n);
  return {
    schools: await count("schools"),
    rooms: await count("rooms"),
    users: await count("users"),
    questions: await count("questions"),
    publishedAnswers: await count("published_answers"),
  };
}
