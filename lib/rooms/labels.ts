export const ROOM_USE_LABELS: Record<string, string> = {
  classroom_5_8: "Classroom (ages 5–8)",
  classroom_9_plus: "Classroom (age 9 and up)",
  lecture: "Lecture room",
  science_lab: "Science lab",
  gym: "Gym",
  office: "Office",
  other: "Other room",
};
