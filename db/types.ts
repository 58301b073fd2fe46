import type { ColumnType, Generated, Insertable, Selectable, Updateable } from "kysely";

/** ISO 8601 text in UTC, written by the application. */
type Timestamp = string;
/** SQLite has no boolean: 0 or 1. */
type Flag = number;

export const ROLES = ["communications", "facilities", "admin"] as const;
export type Role = (typeof ROLES)[number];

export const SCHOOL_LEVELS = ["elementary", "middle", "high"] as const;
export type SchoolLevel = (typeof SCHOOL_LEVELS)[number];

export interface SchoolTable {
  id: Generated<number>;
  slug: string;
  name: string;
  level: SchoolLevel;
  grades: string;
  address: string;
  phone: string;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
}

export interface RoomTable {
  id: Generated<number>;
  school_id: number;
  name: string;
  use: string;
  length_ft: number;
  width_ft: number;
  ceiling_ft: number;
  occupancy: number;
  /** Outdoor air from the unit ventilator or air handler, cfm. */
  outdoor_air_cfm: Generated<number>;
  /** Portable air cleaners in the room. */
  air_cleaners: Generated<number>;
  /** Clean air delivery rate of each air cleaner, cfm. */
  cadr_cfm_each: Generated<number>;
  /** Filter rating, MERV 1–16; null when not known. */
  merv: number | null;
  windows_open: Generated<Flag>;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
  updated_at: Timestamp;
  updated_by: number | null;
}

export interface UserTable {
  id: Generated<number>;
  email: string;
  name: string;
  role: Role;
  password_hash: string;
  disabled_at: Timestamp | null;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
  updated_at: Timestamp;
}

export interface QuestionTable {
  id: Generated<number>;
  reference: string;
  /** null: a district-wide question. */
  school_id: number | null;
  topic: string;
  room: string | null;
  body: string;
  asker_name: string | null;
  asker_email: string;
  language: string;
  state: string;
  technical: Flag;
  assignee_id: number | null;
  status_token_hash: string | null;
  /** Set when the question was joined to another; that question's reply answers this asker too. */
  merged_into_id: ColumnType<number | null, number | null | undefined, number | null>;
  /** The draft facilities approved; a newer draft needs a new check. */
  approved_draft_id: ColumnType<number | null, number | null | undefined, number | null>;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
  updated_at: Timestamp;
}

export interface QuestionDraftTable {
  id: Generated<number>;
  question_id: number;
  body_markdown: string;
  /** The question as the public will read it, without personal details. */
  public_question: Generated<string>;
  author_id: number | null;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
}

export interface QuestionNoteTable {
  id: Generated<number>;
  question_id: number;
  author_id: number | null;
  body: string;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
}

export interface ReplySnippetTable {
  id: Generated<number>;
  title: string;
  body_markdown: string;
  updated_by: number | null;
  updated_at: Timestamp;
}

export interface QuestionStatusTokenTable {
  id: Generated<number>;
  question_id: number;
  token_hash: string;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
}

export interface QuestionEventTable {
  id: Generated<number>;
  question_id: number;
  actor_id: number | null;
  kind: string;
  from_state: string | null;
  to_state: string | null;
  /** JSON text. */
  detail: string | null;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
}

export const OUTBOX_STATUSES = ["pending", "sending", "sent", "failed"] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

export interface OutboxTable {
  id: Generated<number>;
  kind: string;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  status: OutboxStatus;
  attempts: Generated<number>;
  next_attempt_at: Timestamp;
  /** When a sender took the row; a stale claim is released after a crash. */
  claimed_at: Timestamp | null;
  last_error: string | null;
  message_id: string;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
  sent_at: Timestamp | null;
}

export interface OutboxAttemptTable {
  id: Generated<number>;
  outbox_id: number;
  attempted_at: Timestamp;
  ok: Flag;
  error: string | null;
}

export interface SettingTable {
  key: string;
  /** JSON text. */
  value: string;
  updated_at: Timestamp;
}

export interface StaffEventTable {
  id: Generated<number>;
  actor_id: number | null;
  subject_user_id: number | null;
  kind: string;
  detail: string | null;
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
}

export const PROJECT_STATUSES = ["planned", "under_way", "finished"] as const;
export type ProjectStatus = (typeof PROJECT_STATUSES)[number];

export interface BuildingProjectTable {
  id: Generated<number>;
  school_id: number;
  /** Stable name within the school, e.g. "roof"; the seed and imports match on it. */
  key: string;
  title: string;
  kind: string;
  summary: string;
  status: ProjectStatus;
  status_date: string;
  sort_order: Generated<number>;
  updated_at: Timestamp;
  updated_by: number | null;
}

export interface PublishedAnswerTable {
  id: Generated<number>;
  /** The question it grew from, if any; never shown publicly. */
  question_id: number | null;
  /** null: for every school. */
  school_id: number | null;
  topic: string;
  /** The question as rewritten for the public, with no personal details. */
  question_text: string;
  answer_markdown: string;
  published_at: Timestamp;
  unpublished_at: Timestamp | null;
  published_by: number | null;
  updated_at: Timestamp;
}

/** One accepted public question, for the rate limit; keyed hashes only, never the raw address. */
export interface SubmissionAttemptTable {
  id: Generated<number>;
  ip_hash: string;
  email_hash: string;
  created_at: Timestamp;
}

/** The reply as sent to the asker. */
export interface QuestionReplyTable {
  id: Generated<number>;
  question_id: number;
  body_markdown: string;
  sent_at: Timestamp;
  sent_by: number | null;
}

/** One sensor reading; the key is (room_id, measured_at). */
export interface Co2ReadingTable {
  room_id: number;
  /** ISO 8601 in UTC. */
  measured_at: Timestamp;
  co2_ppm: number;
}

/** A room's CO2 figures for one school day (occupied hours only), recomputed after each import. */
export interface Co2DailyTable {
  room_id: number;
  /** YYYY-MM-DD in the district's time zone. */
  day: string;
  readings: number;
  covered_minutes: number;
  mean_ppm: number;
  peak_ppm: number;
  minutes_above: number;
  threshold_ppm: number;
  steady_state_ppm: number | null;
  computed_at: Timestamp;
}

/** One browser's "was this helpful?" on a published answer; the browser is known only by the SHA-256 of its cookie. */
export interface AnswerVoteTable {
  id: Generated<number>;
  answer_id: number;
  voter_hash: string;
  /** 1: it helped; 0: it did not. */
  helpful: Flag;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface Co2ImportTable {
  id: Generated<number>;
  file_name: string;
  uploaded_by: number | null;
  rows_read: number;
  rows_added: number;
  duplicates: number;
  room_days: number;
  first_reading_at: Timestamp | null;
  last_reading_at: Timestamp | null;
  created_at: Timestamp;
}

export interface Database {
  schools: SchoolTable;
  rooms: RoomTable;
  users: UserTable;
  questions: QuestionTable;
  question_events: QuestionEventTable;
  outbox: OutboxTable;
  outbox_attempts: OutboxAttemptTable;
  settings: SettingTable;
  staff_events: StaffEventTable;
  building_projects: BuildingProjectTable;
  published_answers: PublishedAnswerTable;
  submission_attempts: SubmissionAttemptTable;
  question_replies: QuestionReplyTable;
  co2_readings: Co2ReadingTable;
  co2_daily: Co2DailyTable;
  co2_imports: Co2ImportTable;
  answer_votes: AnswerVoteTable;
  question_drafts: QuestionDraftTable;
  question_notes: QuestionNoteTable;
  reply_snippets: ReplySnippetTable;
  question_status_tokens: QuestionStatusTokenTable;
}

export type School = Selectable<SchoolTable>;
export type NewSchool = Insertable<SchoolTable>;
export type Room = Selectable<RoomTable>;
export type NewRoom = Insertable<RoomTable>;
export type RoomUpdate = Updateable<RoomTable>;
export type Co2Daily = Selectable<Co2DailyTable>;
export type Co2Import = Selectable<Co2ImportTable>;
export type User = Selectable<UserTable>;
export type NewUser = Insertable<UserTable>;
export type UserUpdate = Updateable<UserTable>;
export type Question = Selectable<QuestionTable>;
export type NewQuestion = Insertable<QuestionTable>;
export type QuestionEvent = Selectable<QuestionEventTable>;
export type OutboxMessage = Selectable<OutboxTable>;
export type NewOutboxMessage = Insertable<OutboxTable>;
export type Setting = Selectable<SettingTable>;
export type BuildingProject = Selectable<BuildingProjectTable>;
export type PublishedAnswer = Selectable<PublishedAnswerTable>;
export type NewPublishedAnswer = Insertable<PublishedAnswerTable>;
export type QuestionReply = Selectable<QuestionReplyTable>;
