/** The pages every school has, in content/schools/<slug>/<topic>.mdx. */
export const SCHOOL_TOPICS = [
  { slug: "cleaning", label: "Cleaning", askTopic: "cleaning" },
  { slug: "air", label: "Fresh air", askTopic: "air" },
  { slug: "building", label: "Building work", askTopic: "building" },
] as const;

export type SchoolTopicSlug = (typeof SCHOOL_TOPICS)[number]["slug"];

export function isSchoolTopic(value: string): value is SchoolTopicSlug {
  return SCHOOL_TOPICS.some((t) => t.slug === value);
}
