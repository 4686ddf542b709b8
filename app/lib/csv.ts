import { stringify } from "csv-stringify/sync";

/**
 * A text cell a spreadsheet would run as a formula (starting with =, +, -, @, tab or carriage
 * return) gets a leading apostrophe, as OWASP's CSV-injection guidance advises; numbers stay numbers.
 */
export function neutralizeCell(value: unknown): unknown {
  return typeof value === "string" && /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** Rows to CSV text with a header, every text cell neutralized. */
export function toCsv(rows: unknown[][], columns: string[]): string {
  return stringify(
    rows.map((r) => r.map(neutralizeCell)),
    { header: true, columns },
  );
}
