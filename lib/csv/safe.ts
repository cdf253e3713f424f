/**
 * CSV for spreadsheets without formula injection (OWASP "CSV Injection"): a cell that starts with
 * = + - @ tab or carriage return is prefixed with a single quote, so a spreadsheet shows it as text
 * instead of running it. Papa Parse's own `escapeFormulae: true` tests `^[=+\-@\t\r].*$`, which
 * misses a cell with a line break after the formula; hence our own pattern.
 */
import Papa from "papaparse";

const FORMULA_START = /^[=+\-@\t\r]/;

export type CsvValue = string | number | boolean | null | undefined | Date;

function cell(v: CsvValue): string {
  if (v === null || v === undefined) return "";
  if (v instanceof Date) return v.toISOString();
  return String(v);
}

/** Rows → CSV text with a header line, CRLF line ends (RFC 4180), every formula-like cell neutralised. */
export function toSafeCsv(rows: Record<string, CsvValue>[], columns: string[]): string {
  // Every value goes in as a string so that negative numbers are neutralised too: a spreadsheet
  // would otherwise read "-1+2" style cells as a formula.
  const data = rows.map((r) => columns.map((c) => cell(r[c])));
  return Papa.unparse({ fields: columns, data }, { escapeFormulae: FORMULA_START, newline: "\r\n", quotes: false });
}
