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
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
  updated_at: Timestamp;
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
  created_at: ColumnType<Timestamp, Timestamp | undefined, never>;
  updated_at: Timestamp;
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
}

export type School = Selectable<SchoolTable>;
export type NewSchool = Insertable<SchoolTable>;
export type Room = Selectable<RoomTable>;
export type NewRoom = Insertable<RoomTable>;
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
