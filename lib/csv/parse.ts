// A streaming CSV reader after RFC 4180: fields separated by commas, records by
// CRLF (LF and a lone CR are accepted too), fields that hold commas, quotes or line
// breaks wrapped in double quotes, a quote inside them written twice. A UTF-8 byte
// order mark at the very start is dropped. Text is pushed in pieces of any size, so
// a file is never held whole; a record is returned as soon as its line ends.

export interface CsvRecord {
  fields: string[];
  /** 1-based line of the file on which the record starts. */
  line: number;
}

export class CsvSyntaxError extends Error {
  constructor(
    readonly line: number,
    message: string,
  ) {
    super(`line ${line}: ${message}`);
    this.name = "CsvSyntaxError";
  }
}

export interface CsvParserOptions {
  /** Longest record, in characters, before the file is refused (an unclosed quote would otherwise swallow it all). */
  maxRecordChars?: number;
}

export interface CsvParser {
  /** Feeds more text; returns the records completed by it. */
  push(text: string): CsvRecord[];
  /** The 1-based line the next character pushed will be on. */
  readonly line: number;
  /** Ends the input; returns the last record if the file did not end with a line break. */
  end(): CsvRecord[];
}

const COMMA = 44;
const QUOTE = 34;
const CR = 13;
const LF = 10;
const BOM = 0xfeff;

export function createCsvParser(options: CsvParserOptions = {}): CsvParser {
  const maxRecordChars = options.maxRecordChars ?? 100_000;
  let fields: string[] = [];
  let field = "";
  let inQuotes = false;
  /** A closing quote was seen inside a quoted field: the next character decides. */
  let quotePending = false;
  /** The current field began with a quote. */
  let quoted = false;
  /** The current record had a quoted field, so a lone "" is a record, not a blank line. */
  let recordQuoted = false;
  /** The last character ended a record with CR: an LF right after it belongs to it. */
  let skipLf = false;
  /** The last character inside quotes was CR (CRLF inside a field is one line break). */
  let quotedCr = false;
  let atStart = true;
  let line = 1;
  let recordLine = 1;
  let recordChars = 0;
  let ended = false;

  function endField(): void {
    fields.push(field);
    field = "";
    quoted = false;
    quotePending = false;
  }

  function endRecord(out: CsvRecord[]): void {
    endField();
    // A line with nothing on it is no record (blank lines, a trailing line break).
    if (!(fields.length === 1 && fields[0] === "" && !recordQuoted)) out.push({ fields, line: recordLine });
    fields = [];
    recordChars = 0;
    recordQuoted = false;
  }

  return {
    get line() {
      return line;
    },
    push(text) {
      if (ended) throw new Error("this CSV parser has ended");
      const out: CsvRecord[] = [];
      let i = 0;
      if (atStart && text.length > 0) {
        atStart = false;
        if (text.charCodeAt(0) === BOM) i = 1;
      }
      let chunkStart = i;
      // Plain characters are copied in runs, not one at a time.
      const flush = (to: number) => {
        if (to > chunkStart) field += text.slice(chunkStart, to);
      };
      for (; i < text.length; i += 1) {
        const c = text.charCodeAt(i);
        if (skipLf) {
          skipLf = false;
          if (c === LF) {
            chunkStart = i + 1;
            continue;
          }
        }
        if (recordChars === 0) recordLine = line;
        recordChars += 1;
        if (recordChars > maxRecordChars) {
          throw new CsvSyntaxError(recordLine, `a record is longer than ${maxRecordChars} characters (is a quote left open?)`);
        }
        if (inQuotes) {
          if (c === QUOTE) {
            flush(i);
            inQuotes = false;
            quotePending = true;
            chunkStart = i + 1;
          } else if (c === CR) {
            line += 1;
          } else if (c === LF && !quotedCr) {
            line += 1;
          }
          quotedCr = c === CR;
          continue;
        }
        if (quotePending) {
          quotePending = false;
          if (c === QUOTE) {
            // "" inside a quoted field is one quote.
            field += '"';
            inQuotes = true;
            quotedCr = false;
            chunkStart = i + 1;
            continue;
          }
          if (c !== COMMA && c !== CR && c !== LF) {
            throw new CsvSyntaxError(line, "a field in quotes must end at its closing quote; write a quote inside it as two quotes");
          }
        }
        if (c === COMMA) {
          flush(i);
          endField();
          chunkStart = i + 1;
        } else if (c === CR || c === LF) {
          flush(i);
          endRecord(out);
          line += 1;
          skipLf = c === CR;
          chunkStart = i + 1;
        } else if (c === QUOTE && field === "" && i === chunkStart && !quoted) {
          quoted = true;
          recordQuoted = true;
          inQuotes = true;
          quotedCr = false;
          chunkStart = i + 1;
        }
      }
      flush(text.length);
      return out;
    },
    end() {
      if (ended) return [];
      ended = true;
      if (inQuotes) throw new CsvSyntaxError(recordLine, "a quoted field is never closed");
      const out: CsvRecord[] = [];
      if (recordChars > 0) endRecord(out);
      return out;
    },
  };
}

/** Parses a whole string (tests, small inputs). */
export function parseCsv(text: string, options?: CsvParserOptions): CsvRecord[] {
  const parser = createCsvParser(options);
  return [...parser.push(text), ...parser.end()];
}

/**
 * The text of a chunk up to its first byte that cannot be UTF-8, given the bytes the decoder
 * still held from the chunk before: the longest prefix a fresh decoder takes without error
 * (found by halving; only ever run on a file that is being refused).
 */
function textBeforeBadByte(carry: Uint8Array, chunk: Uint8Array): string {
  const bytes = new Uint8Array(carry.length + chunk.length);
  bytes.set(carry);
  bytes.set(chunk, carry.length);
  const decodes = (n: number) => {
    try {
      new TextDecoder("utf-8", { fatal: true, ignoreBOM: true }).decode(bytes.subarray(0, n), { stream: true });
      return true;
    } catch {
      return false;
    }
  };
  let good = 0;
  let bad = bytes.length;
  while (bad - good > 1) {
    const mid = (good + bad) >> 1;
    if (decodes(mid)) good = mid;
    else bad = mid;
  }
  return new TextDecoder("utf-8", { ignoreBOM: true }).decode(bytes.subarray(0, good), { stream: true });
}

/** The bytes at the end of a chunk that may start a character the next chunk completes. */
function unfinishedTail(chunk: Uint8Array): Uint8Array {
  for (let back = 1; back <= Math.min(3, chunk.length); back += 1) {
    const byte = chunk[chunk.length - back]!;
    if ((byte & 0xc0) !== 0x80) {
      const needs = byte >= 0xf0 ? 4 : byte >= 0xe0 ? 3 : byte >= 0xc0 ? 2 : 1;
      return needs > back ? chunk.slice(chunk.length - back) : new Uint8Array(0);
    }
  }
  return chunk.slice(chunk.length - Math.min(3, chunk.length));
}

/**
 * Records from a stream of bytes, decoded as UTF-8 as they arrive, handed over a
 * chunk's worth at a time (an await per record would cost more than the parsing).
 * Bytes that are not UTF-8 are refused with the line they stand on.
 */
export async function* csvRecordBatches(chunks: AsyncIterable<Uint8Array>, options?: CsvParserOptions): AsyncGenerator<CsvRecord[]> {
  const decoder = new TextDecoder("utf-8", { fatal: true, ignoreBOM: true });
  const parser = createCsvParser(options);
  let carry: Uint8Array = new Uint8Array(0);
  const decode = (chunk?: Uint8Array) => {
    let text: string;
    try {
      text = chunk ? decoder.decode(chunk, { stream: true }) : decoder.decode();
    } catch {
      // The parser counts the lines: hand it the good text before the bad byte, then ask.
      parser.push(textBeforeBadByte(carry, chunk ?? new Uint8Array(0)));
      throw new CsvSyntaxError(parser.line, "this line holds bytes that are not UTF-8 text; save the file as CSV UTF-8");
    }
    if (chunk) carry = unfinishedTail(carry.length && chunk.length < 3 ? concat(carry, chunk) : chunk);
    return text;
  };
  for await (const chunk of chunks) {
    const records = parser.push(decode(chunk));
    if (records.length) yield records;
  }
  const last = [...parser.push(decode()), ...parser.end()];
  if (last.length) yield last;
}

function concat(a: Uint8Array, b: Uint8Array): Uint8Array {
  const out = new Uint8Array(a.length + b.length);
  out.set(a);
  out.set(b, a.length);
  return out;
}
