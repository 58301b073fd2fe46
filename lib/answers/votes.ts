import { createHash, randomBytes } from "node:crypto";
import type { DB } from "@/db/connection";
import { getPublishedAnswer } from "./repository";

/**
 * "Was this helpful?": one vote per browser, without an account. The browser keeps a random
 * 256-bit id in an httpOnly cookie; the database keeps only its SHA-256, so a vote cannot be
 * traced to a person. Voting again from the same browser changes the vote, never adds one.
 */
export const VOTER_COOKIE = "clearhall_voter";
/** A year: long enough that a family does not count twice, short enough to be forgotten. */
export const VOTER_COOKIE_MAX_AGE = 365 * 24 * 60 * 60;
const VOTER_TOKEN = /^[A-Za-z0-9_-]{43}$/;

export type Vote = "yes" | "no";

export interface VoteCounts {
  helpful: number;
  notHelpful: number;
}

export function newVoterToken(): string {
  return randomBytes(32).toString("base64url");
}

/** The stored form of a voter cookie; null when the cookie is missing or not one of ours. */
export function voterHash(token: string | undefined | null): string | null {
  if (!token || !VOTER_TOKEN.test(token)) return null;
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export async function voteCounts(db: DB, answerId: number): Promise<VoteCounts> {
  const row = await db
    .selectFrom("answer_votes")
    .select((eb) => [
      eb.fn.sum<number>(eb.case().when("helpful", "=", 1).then(1).else(0).end()).as("yes"),
      eb.fn.sum<number>(eb.case().when("helpful", "=", 0).then(1).else(0).end()).as("no"),
    ])
    .where("answer_id", "=", answerId)
    .executeTakeFirst();
  return { helpful: Number(row?.yes ?? 0), notHelpful: Number(row?.no ?? 0) };
}

/** This browser's vote on an answer, if it has voted. */
export async function voteOf(db: DB, answerId: number, hash: string | null): Promise<Vote | null> {
  if (!hash) return null;
  const row = await db
    .selectFrom("answer_votes")
    .select("helpful")
    .where("answer_id", "=", answerId)
    .where("voter_hash", "=", hash)
    .executeTakeFirst();
  return row ? (row.helpful ? "yes" : "no") : null;
}

/**
 * Records a browser's vote on a published answer. Null when the answer is not published now
 * (unknown or taken down): nothing is stored.
 */
export async function recordVote(
  db: DB,
  answerId: number,
  hash: string,
  vote: Vote,
  now: Date = new Date(),
): Promise<{ counts: VoteCounts; vote: Vote } | null> {
  if (!(await getPublishedAnswer(db, answerId, now))) return null;
  const at = now.toISOString();
  const helpful = vote === "yes" ? 1 : 0;
  await db
    .insertInto("answer_votes")
    .values({ answer_id: answerId, voter_hash: hash, helpful, created_at: at, updated_at: at })
    .onConflict((oc) => oc.columns(["answer_id", "voter_hash"]).doUpdateSet({ helpful, updated_at: at }))
    .execute();
  return { counts: await voteCounts(db, answerId), vote };
}
