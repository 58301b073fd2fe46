import type { Migration } from "kysely";
import * as m0001 from "./0001_schools_and_rooms";
import * as m0002 from "./0002_users";
import * as m0003 from "./0003_questions";
import * as m0004 from "./0004_outbox";
import * as m0005 from "./0005_settings";
import * as m0006 from "./0006_building_projects";
import * as m0007 from "./0007_published_answers";
import * as m0008 from "./0008_submission_attempts";
import * as m0009 from "./0009_question_replies";
import * as m0010 from "./0010_room_air";
import * as m0011 from "./0011_co2_readings";
import * as m0012 from "./0012_answer_votes";
import * as m0013 from "./0013_desk";

/**
 * Every migration, by name, in order. Listed by hand rather than read from the
 * folder so they load the same under tsx, vitest and the Next.js bundle;
 * tests/unit/migrations-index.test.ts fails when a file is missing here.
 */
export const MIGRATIONS: Record<string, Migration> = {
  "0001_schools_and_rooms": m0001,
  "0002_users": m0002,
  "0003_questions": m0003,
  "0004_outbox": m0004,
  "0005_settings": m0005,
  "0006_building_projects": m0006,
  "0007_published_answers": m0007,
  "0008_submission_attempts": m0008,
  "0009_question_replies": m0009,
  "0010_room_air": m0010,
  "0011_co2_readings": m0011,
  "0012_answer_votes": m0012,
  "0013_desk": m0013,
};
