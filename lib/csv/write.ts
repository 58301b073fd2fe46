/** One CSV field: quoted when it holds a comma, a quote, a line break or edge spaces (RFC 4180). */
export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  const text = String(value);
  return /[",\r\n]|^\s|\s$/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** One record with its CRLF line ending. */
export function csvLine(values: readonly (string | number | null | undefined)[]): string {
  return `${values.map(csvField).join(",")}\r\n`;
}
