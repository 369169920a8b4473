/** One CSV field per RFC 4180: quoted (quotes doubled) when it holds a comma, a quote, CR or LF. */
export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** Rows to CSV text: fields joined by commas, every record (the last too) ended by CRLF. */
export function toCsv(rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return rows.map((row) => row.map(csvField).join(',') + '\r\n').join('');
}
