// The question form's limits without zod, so a client component can show them without
// downloading the schema library with the page (lib/validation/question.ts re-exports them).
export const DISTRICT_WIDE = "district";
export const QUESTION_MIN_LENGTH = 10;
export const QUESTION_MAX_LENGTH = 2_000;
export const NAME_MAX_LENGTH = 100;
export const ROOM_MAX_LENGTH = 60;
