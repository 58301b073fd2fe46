// The shapes the desk's JSON API answers with; the desk's client components read the same types.
import type { QuestionState } from "./state-machine";

export interface StaffRef {
  id: number;
  name: string;
}

export interface SchoolRef {
  id: number;
  slug: string;
  name: string;
}

export interface QueueItem {
  id: number;
  reference: string;
  receivedAt: string;
  school: SchoolRef | null;
  topic: string;
  state: QuestionState;
  assignee: StaffRef | null;
  /** The reply target's calendar date (YYYY-MM-DD) in the district's time zone. */
  dueDate: string;
  /** School days left before the reply target; 0 is due today, negative is late. Null once answered, declined or merged. */
  schoolDaysLeft: number | null;
  technical: boolean;
  /** The first 160 characters of the question, for the queue's second line. */
  excerpt: string;
}

export interface QueuePage {
  items: QueueItem[];
  total: number;
  page: number;
  pageSize: number;
}

export interface QuestionEventView {
  id: number;
  kind: string;
  fromState: QuestionState | null;
  toState: QuestionState | null;
  actor: StaffRef | null;
  /** A short line of what happened, in plain words. */
  summary: string;
  /** A comment or reason that came with the event (a reviewer's comment, a decline reason), if any. */
  comment: string | null;
  createdAt: string;
}

export interface NoteView {
  id: number;
  author: StaffRef | null;
  body: string;
  createdAt: string;
}

export interface DraftView {
  id: number;
  bodyMarkdown: string;
  publicQuestion: string;
  author: StaffRef | null;
  createdAt: string;
}

export interface RelatedQuestion {
  id: number;
  reference: string;
  state: QuestionState;
  receivedAt: string;
  excerpt: string;
}

export interface SimilarAnswer {
  id: number;
  question: string;
  school: string | null;
  topic: string;
  url: string;
}

export interface PublicationView {
  id: number;
  questionText: string;
  schoolId: number | null;
  topic: string;
  publishedAt: string;
  unpublishedAt: string | null;
  url: string;
}

export interface PersonalDetailWarning {
  kind: "email" | "phone" | "child_name" | "health";
  field: "answer" | "publicQuestion";
  /** The words that look personal, as found. */
  match: string;
  message: string;
}

export interface QuestionDetail {
  id: number;
  reference: string;
  receivedAt: string;
  school: SchoolRef | null;
  topic: string;
  room: string | null;
  body: string;
  askerName: string | null;
  askerEmail: string;
  language: string;
  state: QuestionState;
  /** Needs a facilities check: a technical topic, or marked by staff. */
  technical: boolean;
  /** Technical because of its topic; staff cannot unmark it. */
  technicalByTopic: boolean;
  assignee: StaffRef | null;
  dueDate: string;
  schoolDaysLeft: number | null;
  mergedInto: RelatedQuestion | null;
  /** Questions joined to this one: their askers get this question's reply too. */
  mergedFrom: RelatedQuestion[];
  /** The newest draft first. */
  drafts: DraftView[];
  notes: NoteView[];
  events: QuestionEventView[];
  otherFromAsker: RelatedQuestion[];
  similarOpen: RelatedQuestion[];
  similarAnswers: SimilarAnswer[];
  publications: PublicationView[];
  reply: { bodyMarkdown: string; sentAt: string; sentBy: StaffRef | null } | null;
  /** The states the server would accept next, for the buttons the desk shows. */
  nextStates: QuestionState[];
  /** What the signed-in staff member may do here. */
  can: {
    edit: boolean;
    review: boolean;
    send: boolean;
    publish: boolean;
  };
}

export interface CheckItem {
  id: number;
  reference: string;
  school: SchoolRef | null;
  topic: string;
  submittedAt: string;
  submittedBy: StaffRef | null;
  excerpt: string;
}

export interface SnippetView {
  id: number;
  title: string;
  bodyMarkdown: string;
  updatedAt: string;
  updatedBy: StaffRef | null;
}
