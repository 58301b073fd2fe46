import { csvRecordBatches, type CsvRecord } from "@/lib/csv";

/** CSV record batches from text, fed in small byte chunks as an upload would arrive. */
export function recordsOf(text: string, chunkSize = 64): AsyncIterable<CsvRecord[]> {
  const bytes = new TextEncoder().encode(text);
  async function* chunks() {
    for (let i = 0; i < bytes.length; i += chunkSize) yield bytes.slice(i, i + chunkSize);
  }
  return csvRecordBatches(chunks());
}
