import { describe, expect, it } from "vitest";
import {
  assertTransition,
  canTransition,
  IllegalTransitionError,
  isTechnicalTopic,
  nextStates,
  QUESTION_STATES,
  QUESTION_TOPICS,
  type QuestionState,
} from "@/lib/questions/state-machine";

const LEGAL_FOR_ALL: ReadonlyArray<readonly [QuestionState, QuestionState]> = [
  ["received", "drafting"],
  ["received", "declined"],
  ["received", "merged"],
  ["drafting", "facilities_check"],
  ["drafting", "declined"],
  ["drafting", "merged"],
  ["facilities_check", "changes_requested"],
  ["facilities_check", "approved"],
  ["changes_requested", "drafting"],
  ["changes_requested", "facilities_check"],
  ["approved", "answered"],
  ["approved", "drafting"],
];
const LEGAL_ONLY_IF_NOT_TECHNICAL: ReadonlyArray<readonly [QuestionState, QuestionState]> = [["drafting", "answered"]];

function expected(from: QuestionState, to: QuestionState, technical: boolean): boolean {
  const pair = (list: ReadonlyArray<readonly [QuestionState, QuestionState]>) => list.some(([f, t]) => f === from && t === to);
  return pair(LEGAL_FOR_ALL) || (!technical && pair(LEGAL_ONLY_IF_NOT_TECHNICAL));
}

const ALL_PAIRS = QUESTION_STATES.flatMap((from) => QUESTION_STATES.map((to) => [from, to] as const));

describe("question state machine", () => {
  it("has the eight states", () => {
    expect(QUESTION_STATES).toEqual(["received", "drafting", "facilities_check", "changes_requested", "approved", "answered", "declined", "merged"]);
    expect(ALL_PAIRS).toHaveLength(64);
  });

  describe.each([true, false])("technical: %s", (technical) => {
    it.each(ALL_PAIRS)("%s → %s", (from, to) => {
      const legal = expected(from, to, technical);
      expect(canTransition(from, to, { technical })).toBe(legal);
      if (legal) {
        expect(() => assertTransition(from, to, { technical })).not.toThrow();
      } else {
        expect(() => assertTransition(from, to, { technical })).toThrow(IllegalTransitionError);
      }
      expect(nextStates(from, { technical }).includes(to)).toBe(legal);
    });
  });

  it("counts 13 legal moves for a plain question and 12 for a technical one", () => {
    expect(ALL_PAIRS.filter(([f, t]) => canTransition(f, t, { technical: false }))).toHaveLength(13);
    expect(ALL_PAIRS.filter(([f, t]) => canTransition(f, t, { technical: true }))).toHaveLength(12);
  });

  it("answered, declined and merged are final", () => {
    for (const state of ["answered", "declined", "merged"] as const) {
      expect(nextStates(state, { technical: false })).toEqual([]);
      expect(nextStates(state, { technical: true })).toEqual([]);
    }
  });

  it("throws an error that carries from, to and a code a route maps to 409", () => {
    try {
      assertTransition("drafting", "answered", { technical: true });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(IllegalTransitionError);
      const e = error as IllegalTransitionError;
      expect(e).toMatchObject({ from: "drafting", to: "answered", technical: true, code: "illegal_transition" });
      expect(e.message).toMatch(/facilities check/);
    }
  });

  it("air, building and cleaning are technical topics; the rest and unknown strings are not", () => {
    expect(QUESTION_TOPICS.filter(isTechnicalTopic)).toEqual(["cleaning", "air", "building"]);
    expect(isTechnicalTopic("signs")).toBe(false);
    expect(isTechnicalTopic("Air")).toBe(false);
    expect(isTechnicalTopic("chemistry")).toBe(false);
  });
});
