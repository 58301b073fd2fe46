/** The district-wide pages, in the order families need them. Each has content/district/<slug>.mdx. */
export const DISTRICT_TOPICS = [
  { slug: "first-day-back", title: "The first day back", blurb: "Arrival times, which door to use, what to bring and how pick-up works." },
  { slug: "cleaning-and-disinfection", title: "Cleaning and disinfection", blurb: "How rooms are cleaned every day, what we use, and what changes after a reported case." },
  { slug: "signs-and-routes", title: "Signs and hallway routes", blurb: "What the new signs mean and how one-way hallways and stairs work." },
  { slug: "when-a-case-is-reported", title: "When a case is reported", blurb: "What the school does, how families are told, and how we protect every child's privacy." },
] as const;

export type DistrictTopicSlug = (typeof DISTRICT_TOPICS)[number]["slug"];
