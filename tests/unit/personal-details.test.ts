import { describe, expect, it } from "vitest";
import { findPersonalDetails } from "@/lib/questions/personal-details";

const kinds = (text: string, field: "answer" | "publicQuestion" = "publicQuestion") => findPersonalDetails(text, field).map((w) => w.kind);
const matches = (text: string, kind: string, field: "answer" | "publicQuestion" = "publicQuestion") =>
  findPersonalDetails(text, field)
    .filter((w) => w.kind === kind)
    .map((w) => w.match);

describe("findPersonalDetails: e-mail addresses", () => {
  it("finds plain and dotted addresses, wherever they sit in a sentence", () => {
    expect(matches("Write to me at dana.parent+school@example.net.", "email")).toEqual(["dana.parent+school@example.net"]);
    expect(matches("(j_perrault@mail.example.co.uk) or a.b@example.org", "email")).toEqual(["j_perrault@mail.example.co.uk", "a.b@example.org"]);
  });

  it("says which field it was found in, and what to do", () => {
    const [answer] = findPersonalDetails("Reply to parent@example.net", "answer");
    expect(answer).toMatchObject({ kind: "email", field: "answer", match: "parent@example.net" });
    expect(answer?.message).toMatch(/district address/);
    const [publicQuestion] = findPersonalDetails("Reply to parent@example.net", "publicQuestion");
    expect(publicQuestion?.field).toBe("publicQuestion");
    expect(publicQuestion?.message).toMatch(/before publishing/);
  });

  it("does not take an @ without a domain for an address", () => {
    expect(kinds("Meet @ the front door at 8:15.")).toEqual([]);
  });
});

describe("findPersonalDetails: phone numbers (North American formats)", () => {
  it.each([
    ["555-123-4567"],
    ["(555) 123-4567"],
    ["(555)123-4567"],
    ["555.123.4567"],
    ["555 123 4567"],
    ["5551234567"],
    ["+1 555 123 4567"],
    ["1-555-123-4567"],
    ["555-123-4567 ext. 12"],
  ])("finds %s", (number) => {
    expect(matches(`Please call me on ${number} after six.`, "phone")).toEqual([number]);
  });

  it("finds a seven-digit number only when the words say it is one to call", () => {
    expect(matches("Text me at 555-0142 if the bus is late.", "phone")).toEqual(["555-0142"]);
    expect(kinds("Rooms 101-1204 were cleaned.")).toEqual([]);
  });

  it("gives no false alarm on a phone word with no digits, references, dates, years or figures", () => {
    expect(kinds("Phone the office at the main number and ask for the school nurse.", "answer")).toEqual([]);
    expect(kinds("Your reference is Q-2026-0001, sent on 2026-11-23 at 14:05.", "answer")).toEqual([]);
    expect(kinds("The unit ventilator delivers 450 cfm, about 1200 to 1500 ppm at the peak in 2025-2026.", "answer")).toEqual([]);
    expect(kinds("Order 123456789012 arrived.", "answer")).toEqual([]);
  });
});

describe("findPersonalDetails: a child's name after a relationship word", () => {
  it.each([
    ["Does my son Jamie get fresh air in Room 104?", "my son Jamie"],
    ["My daughter, Priya, has a cough.", "My daughter, Priya"],
    ["Our 7-year-old son (Teodor) is in grade 2.", "Our 7-year-old son Teodor"],
    ["my son's name is Jamie and he is in Room 104", "my son's name is Jamie"],
    ["her youngest daughter named Wren-Alys starts Monday", "her youngest daughter named Wren-Alys"],
    ["Is your child Odile in the morning group?", "your child Odile"],
    ["My stepdaughter Maëlle walks to school.", "My stepdaughter Maëlle"],
  ])("finds the name in %j", (text, match) => {
    expect(matches(text, "child_name")).toEqual([match]);
  });

  it("reads the name from the word after the relation, not from ordinary words", () => {
    expect(kinds("My daughter says the desks are still close together.")).toEqual([]);
    expect(kinds("My son I think is in Room 203.")).toEqual([]);
    expect(kinds("My son's teacher moved the desks.")).toEqual([]);
    expect(kinds("Our children The older ones walk.")).toEqual([]);
    expect(kinds("Ask the school nurse about your child.", "answer")).toEqual([]);
  });

  it("suggests a neutral wording", () => {
    expect(findPersonalDetails("my son Jamie", "answer")[0]?.message).toMatch(/"my child" or "a student"/);
  });
});

describe("findPersonalDetails: health details about someone", () => {
  it.each([
    ["My daughter has asthma and uses an inhaler.", ["asthma", "inhaler"]],
    ["He is diabetic and was diagnosed last year.", ["diabetic", "diagnosed"]],
    ["She carries an EpiPen for a peanut allergy.", ["EpiPen", "allergy"]],
    ["My son is immunocompromised.", ["immunocompromised"]],
    ["Jamie's diabetes means he eats at ten.", ["diabetes"]],
    ["Is the spray safe for your daughter's allergies?", ["allergies"]],
  ])("finds the health words in %j", (text, words) => {
    expect(matches(text, "health")).toEqual(words);
  });

  it("leaves general statements alone: a public question can speak of children with asthma", () => {
    expect(kinds("Are the disinfectants used at night safe for children with asthma?")).toEqual([]);
    expect(kinds("Students who use an inhaler keep it with the school nurse.", "answer")).toEqual([]);
    expect(kinds("The school nurse has a room by the front office.", "answer")).toEqual([]);
  });

  it("looks at each sentence on its own", () => {
    expect(kinds("My son is in Room 104. Students with asthma can keep an inhaler in class.")).toEqual([]);
  });
});

describe("findPersonalDetails: together", () => {
  it("lists each finding once, in the order it appears", () => {
    const text = "My son Jamie has asthma. Call 555-123-4567 or write to a.parent@example.net. Jamie has asthma, as I said; call 555-123-4567.";
    expect(findPersonalDetails(text, "publicQuestion").map((w) => `${w.kind}:${w.match}`)).toEqual([
      "child_name:My son Jamie",
      "health:asthma",
      "phone:555-123-4567",
      "email:a.parent@example.net",
    ]);
  });

  it("finds nothing in a clean public question from the demo data", () => {
    expect(findPersonalDetails("What do the cleaning crews use in classrooms at night, and is it safe the next morning?", "publicQuestion")).toEqual([]);
  });

  it("finds the personal details in the demo district's raw questions", () => {
    expect(kinds("What do the cleaning crews spray in the classrooms at night? My daughter has asthma and I want to know if it is safe for her the next morning.")).toEqual([
      "health",
    ]);
  });
});
