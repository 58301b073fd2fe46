// The answers search's small shared values, kept apart from the engine (lib/answers/search.ts,
// which brings Fuse.js) so the answers page's first load does not carry the engine: the browser
// fetches that only once the page is showing (components/answers/answers-search.tsx).

/** Stands for "every school" in filters, the API and the index. */
export const DISTRICT = "district";
export const MAX_QUERY_LENGTH = 200;
