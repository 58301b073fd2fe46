/** Languages offered in the form, each named in its own language; the API takes any BCP 47 tag. */
export const REPLY_LANGUAGES = [
  { tag: "en", label: "English" },
  { tag: "es", label: "Español" },
  { tag: "vi", label: "Tiếng Việt" },
  { tag: "zh-Hans", label: "中文（简体）" },
  { tag: "ar", label: "العربية" },
  { tag: "ht", label: "Kreyòl ayisyen" },
  { tag: "pt", label: "Português" },
] as const;

export const DEFAULT_REPLY_LANGUAGE = "en";

/** The canonical form of a BCP 47 tag ("en-us" → "en-US"), or null when it is not one. */
export function canonicalLanguageTag(tag: string): string | null {
  try {
    return Intl.getCanonicalLocales(tag)[0] ?? null;
  } catch {
    return null;
  }
}

/** "Spanish (español)" for "es": the English name for staff, and the language's own name for the asker. */
export function languageName(tag: string): string {
  const offered = REPLY_LANGUAGES.find((l) => l.tag === tag);
  try {
    const english = new Intl.DisplayNames(["en"], { type: "language" }).of(tag);
    if (!english || english === tag) return offered?.label ?? tag;
    if (tag === "en") return english;
    const own = offered?.label ?? new Intl.DisplayNames([tag], { type: "language" }).of(tag);
    return own && own !== english ? `${english} (${own})` : english;
  } catch {
    return offered?.label ?? tag;
  }
}
