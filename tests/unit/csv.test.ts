import { describe, expect, it } from "vitest";
import { createCsvParser, csvField, csvLine, csvRecordBatches, CsvSyntaxError, parseCsv, type CsvRecord } from "@/lib/csv";

const fieldsOf = (records: CsvRecord[]) => records.map((r) => r.fields);

/** Feeds the text cut at every position (and one character at a time), so no state may depend on where a chunk ends. */
function allSplits(text: string): CsvRecord[][] {
  const results: CsvRecord[][] = [];
  for (let cut = 0; cut <= text.length; cut += 1) {
    const parser = createCsvParser();
    results.push([...parser.push(text.slice(0, cut)), ...parser.push(text.slice(cut)), ...parser.end()]);
  }
  const oneByOne = createCsvParser();
  const records: CsvRecord[] = [];
  for (const ch of text) records.push(...oneByOne.push(ch));
  records.push(...oneByOne.end());
  results.push(records);
  return results;
}

describe("CSV reader (RFC 4180)", () => {
  it("splits fields on commas and records on CRLF", () => {
    expect(fieldsOf(parseCsv("a,b,c\r\n1,2,3\r\n"))).toEqual([
      ["a", "b", "c"],
      ["1", "2", "3"],
    ]);
  });

  it("accepts LF and lone CR line endings, and a last line with no line break", () => {
    expect(fieldsOf(parseCsv("a,b\n1,2\r3,4"))).toEqual([
      ["a", "b"],
      ["1", "2"],
      ["3", "4"],
    ]);
  });

  it("reads quoted fields holding commas, doubled quotes and line breaks", () => {
    const text = 'name,note\r\n"Room 1, east","He said ""open"" twice"\r\n"two\r\nlines",x\r\n';
    expect(fieldsOf(parseCsv(text))).toEqual([
      ["name", "note"],
      ["Room 1, east", 'He said "open" twice'],
      ["two\r\nlines", "x"],
    ]);
  });

  it("keeps empty fields and an explicitly quoted empty field", () => {
    expect(fieldsOf(parseCsv('a,,c\r\n,\r\n""\r\n'))).toEqual([["a", "", "c"], ["", ""], [""]]);
  });

  it("drops a UTF-8 byte order mark at the start, and only there", () => {
    expect(fieldsOf(parseCsv("\uFEFFschool,room\r\nx,\uFEFFy\r\n"))).toEqual([
      ["school", "room"],
      ["x", "\uFEFFy"],
    ]);
  });

  it("skips blank lines and numbers records by the line they start on", () => {
    const records = parseCsv('a\r\n\r\n"b\r\nc"\r\nd\n\n');
    expect(records).toEqual([
      { fields: ["a"], line: 1 },
      { fields: ["b\r\nc"], line: 3 },
      { fields: ["d"], line: 5 },
    ]);
  });

  it("gives the same records wherever the text is cut into chunks", () => {
    const text = '\uFEFFschool,room,note\r\ntamsin-creek,"Room 101","a ""quoted"", comma"\r\n"x\r\ny",,z\r\nlast,row,"ends"';
    const expected = parseCsv(text);
    expect(fieldsOf(expected)).toEqual([
      ["school", "room", "note"],
      ["tamsin-creek", "Room 101", 'a "quoted", comma'],
      ["x\r\ny", "", "z"],
      ["last", "row", "ends"],
    ]);
    for (const result of allSplits(text)) expect(result).toEqual(expected);
  });

  it("refuses a quote that closes too early and a quote never closed, naming the line", () => {
    expect(() => parseCsv('a\r\n"b"c,d\r\n')).toThrow(CsvSyntaxError);
    expect(() => parseCsv('a\r\n"b"c,d\r\n')).toThrow(/line 2/);
    expect(() => parseCsv('a\r\nb,"never closed\r\nmore')).toThrow(/line 2: a quoted field is never closed/);
  });

  it("refuses a record longer than the limit instead of holding the whole file", () => {
    expect(() => parseCsv(`"${"x".repeat(200)}`, { maxRecordChars: 100 })).toThrow(/longer than 100 characters/);
  });

  it("decodes bytes as UTF-8 across chunk edges, BOM included", async () => {
    const bytes = new TextEncoder().encode("\uFEFFroom,ppm\r\nSalle é,1200\r\n");
    async function* chunks() {
      for (let i = 0; i < bytes.length; i += 3) yield bytes.slice(i, i + 3);
    }
    const records: CsvRecord[] = [];
    for await (const batch of csvRecordBatches(chunks())) records.push(...batch);
    expect(fieldsOf(records)).toEqual([
      ["room", "ppm"],
      ["Salle é", "1200"],
    ]);
  });

  it("refuses bytes that are not UTF-8", async () => {
    async function* chunks() {
      yield new Uint8Array([0x61, 0x2c, 0xff, 0x0a]);
    }
    await expect(async () => {
      for await (const _ of csvRecordBatches(chunks())) void _;
    }).rejects.toThrow(/not UTF-8/);
  });

  /** The line the reader names for the first byte that is not UTF-8, the bytes cut into pieces of `size`. */
  async function badLine(bytes: Uint8Array, size: number): Promise<string> {
    async function* chunks() {
      for (let i = 0; i < bytes.length; i += size) yield bytes.slice(i, i + size);
    }
    try {
      for await (const _ of csvRecordBatches(chunks())) void _;
    } catch (error) {
      return (error as Error).message;
    }
    return "no error";
  }
  const bytesOf = (...parts: (string | number[])[]) =>
    Uint8Array.from(parts.flatMap((p) => (typeof p === "string" ? [...new TextEncoder().encode(p)] : p)));

  it("names the line of a byte that is not UTF-8, wherever the chunks are cut", async () => {
    // Line 3 holds "Salle " then 0xE8 (è in Windows-1252); lines before it use CRLF, LF and é (two bytes).
    const bytes = bytesOf("room,ppm\r\nSalle é,1200\n", "Salle ", [0xe8], ",900\r\n");
    for (const size of [1, 2, 3, 5, 7, 4096]) {
      expect(await badLine(bytes, size), `chunks of ${size}`).toMatch(/^line 3: .*not UTF-8/);
    }
  });

  it("counts a CRLF split across chunks once and a lone CR as a line break", async () => {
    const bytes = bytesOf("a\r\nb\rc\n", [0xff], "\n");
    for (const size of [1, 2, 3]) expect(await badLine(bytes, size), `chunks of ${size}`).toMatch(/^line 4: /);
  });

  it("names the last line when the file ends inside a character", async () => {
    const bytes = bytesOf("room\nSalle ", [0xc3]);
    for (const size of [1, 4096]) expect(await badLine(bytes, size), `chunks of ${size}`).toMatch(/^line 2: .*not UTF-8/);
  });
});

describe("CSV writer", () => {
  it("quotes only what needs it and round-trips through the reader", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField('say "hi", then go')).toBe('"say ""hi"", then go"');
    expect(csvField(" padded")).toBe('" padded"');
    expect(csvField(null)).toBe("");
    expect(csvField(12.5)).toBe("12.5");
    const line = csvLine(["a,b", 'q"', "two\nlines", 3]);
    expect(line.endsWith("\r\n")).toBe(true);
    expect(fieldsOf(parseCsv(line))).toEqual([["a,b", 'q"', "two\nlines", "3"]]);
  });
});
