/** Words staff and families read for each topic and state; the codes stay fixed in the data and API. */
export const TOPIC_LABELS: Record<string, string> = {
  cleaning: "Cleaning",
  air: "Air and ventilation",
  building: "Building work",
  signs: "Signs and routes",
  distancing: "Distancing and classrooms",
  cases: "If a case is reported",
  other: "Other",
};

export const STATE_LABELS: Record<string, string> = {
  received: "New",
  drafting: "Being written",
  facilities_check: "With facilities for a check",
  changes_requested: "Sent back by facilities",
  approved: "Checked, ready to send",
  answered: "Answered",
  declined: "Declined",
  merged: "Joined to another question",
};
