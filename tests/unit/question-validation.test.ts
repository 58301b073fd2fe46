import { describe, expect, it } from "vitest";
import { askFormFromFormData, askFormSchema, questionSchema } from "@/lib/validation/question";
import { canonicalLanguageTag, languageName } from "@/lib/questions/languages";

const valid = {
  school: "tamsin-creek",
  topic: "air",
  question: "Does Room 104 get fresh air from outside?",
  email: "parent@example.net",
};

function errorsOf(input: unknown): Record<string, string> {
  const result = questionSchema.safeParse(input);
  if (result.success) return {};
  return Object.fromEntries(result.error.issues.map((i) => [i.path.join(".") || "_form", i.message]));
}

describe("questionSchema", () => {
  it("accepts a plain question, trims it, lowercases the e-mail and defaults the language to en", () => {
    const parsed = questionSchema.parse({ ...valid, question: `  ${valid.question}  `, email: " Parent@Example.NET ", room: "", name: null });
    expect(parsed).toEqual({ school: "tamsin-creek", topic: "air", question: valid.question, email: "parent@example.net", language: "en" });
  });

  it("takes district-wide questions and any BCP 47 tag, in canonical form", () => {
    expect(questionSchema.parse({ ...valid, school: "district", language: "zh-hans" })).toMatchObject({ school: "district", language: "zh-Hans" });
    expect(questionSchema.parse({ ...valid, language: "es-419" }).language).toBe("es-419");
    expect(questionSchema.parse({ ...valid, language: "ht" }).language).toBe("ht");
    expect(errorsOf({ ...valid, language: "not a tag" })).toHaveProperty("language");
    expect(errorsOf({ ...valid, language: "en_US" })).toHaveProperty("language");
  });

  it("names each missing or bad field in plain words", () => {
    expect(errorsOf({})).toEqual({
      school: "Choose your child's school, or the whole district.",
      topic: "Choose what your question is about.",
      question: "Write your question.",
      email: "Enter your e-mail address, so we can send you the reply.",
    });
    expect(errorsOf({ ...valid, email: undefined })).toEqual({ email: "Enter your e-mail address, so we can send you the reply." });
    expect(errorsOf({ ...valid, email: "parent at example" }).email).toMatch(/whole e-mail address/);
    expect(errorsOf({ ...valid, topic: "weather" })).toEqual({ topic: "Choose what your question is about." });
    expect(errorsOf({ ...valid, school: "Tamsin Creek!" })).toHaveProperty("school");
  });

  it("keeps the question between 10 and 2,000 characters", () => {
    expect(errorsOf({ ...valid, question: "Hello" }).question).toMatch(/at least 10 characters/);
    expect(errorsOf({ ...valid, question: "         x         " }).question).toMatch(/at least 10 characters/);
    expect(errorsOf({ ...valid, question: "a".repeat(2_000) })).toEqual({});
    expect(errorsOf({ ...valid, question: "a".repeat(2_001) }).question).toMatch(/2,000 characters or fewer/);
  });

  it("refuses control characters, but keeps line breaks and tabs in the question", () => {
    expect(errorsOf({ ...valid, question: "First line\nsecond line\twith a tab" })).toEqual({});
    expect(errorsOf({ ...valid, question: "Null \u0000 inside this text" }).question).toMatch(/hidden control characters/);
    expect(errorsOf({ ...valid, question: "Escape \u001b[31m red text here" }).question).toMatch(/hidden control characters/);
    expect(errorsOf({ ...valid, question: "A broken \ud800 surrogate here" }).question).toMatch(/hidden control characters/);
    expect(errorsOf({ ...valid, name: "Ada\nBcc: someone@example.net" }).name).toMatch(/hidden control characters/);
    expect(errorsOf({ ...valid, room: "Room\u0007 4" }).room).toMatch(/hidden control characters/);
    // Other scripts and emoji are text, not control characters.
    expect(errorsOf({ ...valid, question: "¿Dónde esperan los padres? 你好 مرحبا 😀", name: "Nguyễn" })).toEqual({});
  });

  it("treats a filled honeypot as an error and never passes its value on", () => {
    expect(errorsOf({ ...valid, website: "http://spam.example.com" })).toEqual({
      website: "Leave this field empty. It is there to catch automated messages.",
    });
    expect(questionSchema.parse({ ...valid, website: "" })).not.toHaveProperty("website", expect.anything());
  });

  it("asks for a JSON object, not some other value", () => {
    expect(errorsOf("a question")).toHaveProperty("_form");
    expect(errorsOf([valid])).toHaveProperty("_form");
  });
});

describe("askFormSchema", () => {
  it("also needs the consent box ticked", () => {
    expect(askFormSchema.safeParse({ ...valid, consent: true }).success).toBe(true);
    const refused = askFormSchema.safeParse({ ...valid, consent: false });
    expect(refused.success).toBe(false);
    expect(refused.error?.issues[0]).toMatchObject({ path: ["consent"], message: expect.stringMatching(/Tick the box/) });
  });

  it("reads the fields a browser posts, with or without JavaScript", () => {
    const form = new FormData();
    for (const [k, v] of Object.entries({ ...valid, room: "Room 104", name: "", language: "es", website: "", consent: "on" })) form.set(k, v);
    form.set("$ACTION_ID_abc", "");
    const values = askFormFromFormData(form);
    expect(values).toEqual({ ...valid, room: "Room 104", name: "", language: "es", website: "", consent: true });
    expect(askFormSchema.parse(values)).toMatchObject({ room: "Room 104", language: "es", consent: true });
    form.delete("consent");
    expect(askFormFromFormData(form).consent).toBe(false);
  });
});

describe("reply languages", () => {
  it("canonicalizes tags and names them for staff and for the asker", () => {
    expect(canonicalLanguageTag("EN-us")).toBe("en-US");
    expect(canonicalLanguageTag("nope nope")).toBeNull();
    expect(languageName("en")).toBe("English");
    expect(languageName("es")).toBe("Spanish (Español)");
    expect(languageName("vi")).toBe("Vietnamese (Tiếng Việt)");
  });
});
