import { stringify } from 'csv-stringify/sync';

/**
 * Text a spreadsheet would run as a formula (`= + - @`, or a leading tab or carriage return)
 * gets a leading apostrophe: names, notes, device ids and details come from users and clients.
 * Numbers are written as numbers (a negative value is not text).
 */
export function neutraliseFormula(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/**
 * The one CSV writer for every export (csv-stringify): RFC 4180 quoting (a lone CR or LF is
 * quoted too), CRLF line ends, formula cells neutralised, dates as ISO 8601, booleans as
 * `true`/`false`, objects as JSON, null and undefined as empty cells.
 */
export function csvLines(rows: readonly (readonly unknown[])[]): string {
  return stringify(
    rows.map((r) => [...r]),
    {
      record_delimiter: 'windows',
      quoted_match: /[\r\n]/,
      cast: {
        string: neutraliseFormula,
        boolean: (v) => (v ? 'true' : 'false'),
        date: (v) => v.toISOString(),
        object: (v) => neutraliseFormula(JSON.stringify(v)),
      },
    },
  );
}

/** One CSV line (for streamed exports that write a line at a time). */
export const csvLine = (fields: readonly unknown[]): string => csvLines([fields]);
