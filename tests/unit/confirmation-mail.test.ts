import { describe, expect, it } from "vitest";
import { confirmationMail, formatReplyDate } from "@/lib/questions/confirmation-mail";
import { parentStatus, PARENT_STATUS } from "@/lib/questions/parent-status";
import { QUESTION_STATES } from "@/lib/questions/state-machine";
import { formatQuestionReference, isQuestionReference } from "@/lib/questions/reference";
import { hashStatusToken, newStatusToken } from "@/lib/questions/status-token";

const details = {
  districtName: "Wrenmoor Valley School District",
  reference: "Q-2026-0042",
  question: 'Is the <b>air</b> "fresh"?\nSecond line & more.',
  schoolName: "Eastmere High School",
  topicLabel: "Air and ventilation",
  room: "Room A104",
  askerName: "Ada <Example>",
  languageName: "Spanish (Español)",
  technical: true,
  targetSchoolDays: 3,
  replyBy: "2026-12-04",
  statusUrl: "https://reopening.example.org/ask/status/abc_DEF-123",
};

describe("confirmationMail", () => {
  const mail = confirmationMail(details);

  it("carries the reference, a copy of the question, the reply target and the private link", () => {
    expect(mail.subject).toBe("We received your question (Q-2026-0042)");
    for (const body of [mail.text, mail.html]) {
      expect(body).toContain("Q-2026-0042");
      expect(body).toContain("https://reopening.example.org/ask/status/abc_DEF-123");
      expect(body).toContain("within 3 school days, by Friday, December 4, 2026");
      expect(body).toContain("facilities team checks the answer");
      expect(body).toMatch(/local health department/);
    }
    expect(mail.text).toContain("> Is the <b>air</b> \"fresh\"?\n> Second line & more.");
  });

  it("escapes everything the asker typed in the HTML version", () => {
    expect(mail.html).toContain("Is the &lt;b&gt;air&lt;/b&gt; &quot;fresh&quot;?");
    expect(mail.html).toContain("Hello Ada &lt;Example&gt;,");
    expect(mail.html).not.toContain("<b>air</b>");
    expect(mail.html).toContain('<html lang="en">');
  });

  it("leaves out the facilities step for questions that need no check, and greets without a name", () => {
    const plain = confirmationMail({ ...details, technical: false, askerName: null, room: null, schoolName: null });
    expect(plain.text).not.toContain("facilities team");
    expect(plain.text.startsWith("Hello,\n")).toBe(true);
    expect(plain.text).toContain("School: All schools (district-wide)");
    expect(plain.text).not.toContain("Room or grade");
  });

  it("formats a calendar date on its own day", () => {
    expect(formatReplyDate("2027-01-01")).toBe("Friday, January 1, 2027");
  });
});

describe("parent-facing states", () => {
  it("has words for every state and keeps the internal check steps from families", () => {
    for (const state of QUESTION_STATES) expect(PARENT_STATUS[state].label.length).toBeGreaterThan(0);
    expect(parentStatus("changes_requested").label).toBe(parentStatus("facilities_check").label);
    expect(parentStatus("answered").step).toBe("answered");
  });
});

describe("references and status tokens", () => {
  it("formats references as Q-year-sequence", () => {
    expect(formatQuestionReference(2026, 42)).toBe("Q-2026-0042");
    expect(formatQuestionReference(2026, 12345)).toBe("Q-2026-12345");
    expect(isQuestionReference("Q-2026-0042")).toBe(true);
    expect(isQuestionReference("Q-2026-42")).toBe(false);
  });

  it("makes 256-bit URL-safe tokens and stores only their SHA-256", () => {
    const a = newStatusToken();
    const b = newStatusToken();
    expect(a.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(a.token, "base64url")).toHaveLength(32);
    expect(a.token).not.toBe(b.token);
    expect(a.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(a.hash).toBe(hashStatusToken(a.token));
    expect(a.hash).not.toContain(a.token);
  });
});
