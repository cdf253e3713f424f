/**
 * Riser's one CSV writer (Papa Parse for quoting, RFC 4180: CRLF line ends, a field with a comma,
 * quote or line break in double quotes with its quotes doubled) with the spreadsheet formula guard
 * from OWASP "CSV Injection": a cell that starts with = + - @ tab or carriage return gets a leading
 * single quote, so a spreadsheet shows it as text instead of running it. Numbers go through the guard
 * as text too ("-5" becomes "'-5"), so a negative number can never start a formula.
 *
 * Papa Parse's own `escapeFormulae: true` tests `^[=+\-@\t\r].*$`, which misses a cell with a line
 * break after the formula, and it quotes every guarded cell; hence the guard is applied here first.
 * No server code: also usable in the browser.
 */
import Papa from "papaparse";
import { log } from "@/lib/log";

const FORMULA_START = /^[=+\-@\t\r]/;

export type CsvValue = string | number | boolean | null | undefined | Date;

/** The OWASP guard on one value: a formula-like start gets a single quote in front. */
export function neutralise(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

function text(v: CsvValue): string {
  if (v === null || v === undefined) return "";
  if (v instanceof Date) return v.toISOString();
  return String(v);
}

const unparse = (rows: string[][]) => Papa.unparse(rows, { newline: "\r\n", quotes: false, delimiter: ",", header: false });

/** One guarded, quoted cell. */
export function csvCell(value: CsvValue): string {
  return unparse([[neutralise(text(value))]]);
}

/** One guarded line, ending in CRLF. */
export function csvLine(cells: CsvValue[]): string {
  return `${unparse([cells.map((c) => neutralise(text(c)))])}\r\n`;
}

/** Lines of cells → CSV text (each line ends in CRLF). */
export function csvLines(rows: CsvValue[][]): string {
  return rows.length ? `${unparse(rows.map((r) => r.map((c) => neutralise(text(c)))))}\r\n` : "";
}

/** Rows → CSV text with a header line, CRLF between lines, every formula-like cell neutralised. */
export function toSafeCsv(rows: Record<string, CsvValue>[], columns: string[]): string {
  return unparse([columns.map(neutralise), ...rows.map((r) => columns.map((c) => neutralise(text(r[c]))))]);
}

const BOM = "\uFEFF"; // lets spreadsheet programs read accented names as UTF-8

function csvHeaders(fileName: string, extra: Record<string, string> = {}): HeadersInit {
  return {
    "Content-Type": "text/csv; charset=utf-8",
    "Content-Disposition": `attachment; filename="${fileName.replace(/[^A-Za-z0-9._-]/g, "_")}"`,
    "Cache-Control": "no-store",
    "X-Content-Type-Options": "nosniff",
    ...extra,
  };
}

/** A CSV download of text already made by this module (byte-order mark added). */
export function csvDownload(fileName: string, csv: string, extraHeaders?: Record<string, string>): Response {
  return new Response(`${BOM}${csv}`, { headers: csvHeaders(fileName, extraHeaders) });
}

/**
 * A streamed CSV download: the header first, then whatever lines the generator yields, chunk by
 * chunk, so a large export never sits in memory whole. The first chunk is read before answering, so
 * a failure there still gets a real error status.
 */
export async function csvResponse(fileName: string, header: string[], lines: () => AsyncGenerator<CsvValue[][]>): Promise<Response> {
  const enc = new TextEncoder();
  const iterator = lines();
  const first = await iterator.next();
  const stream = new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(enc.encode(`${BOM}${csvLine(header)}`));
      if (first.done) controller.close();
      else controller.enqueue(enc.encode(csvLines(first.value)));
    },
    async pull(controller) {
      try {
        const { value, done } = await iterator.next();
        if (done) {
          controller.close();
          return;
        }
        controller.enqueue(enc.encode(csvLines(value)));
      } catch (err) {
        log().error({ err }, "CSV export failed part-way");
        controller.error(err);
      }
    },
    async cancel() {
      await iterator.return?.(undefined);
    },
  });
  return new Response(stream, { headers: csvHeaders(fileName) });
}
