/**
 * CSV output (RFC 4180 quoting) with spreadsheet formula injection neutralised: a cell that
 * begins with =, +, -, @, a tab or a carriage return is prefixed with a single quote, so a
 * spreadsheet shows it as text instead of evaluating it (the OWASP "CSV injection" advice).
 * Pure functions plus a streaming Response builder; no server code.
 */

const FORMULA_START = /^[=+\-@\t\r]/;

export function neutralise(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

export function csvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  const s = neutralise(String(value));
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export const csvLine = (cells: (string | number | null | undefined)[]) => `${cells.map(csvCell).join(",")}\r\n`;

/**
 * A streamed CSV download: the header first, then whatever lines the generator yields, chunk by
 * chunk, so a large export never sits in memory whole (the first chunk is fetched before the
 * response starts, so that an early failure still gets an error status). A UTF-8 byte-order mark lets spreadsheet
 * programs read accented names correctly.
 */
export async function csvResponse(fileName: string, header: string[], lines: () => AsyncGenerator<(string | number | null)[][]>): Promise<Response> {
  const enc = new TextEncoder();
  const iterator = lines();
  // The first chunk is read before answering, so a failure there is a real error status.
  const first = await iterator.next();
  const stream = new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(enc.encode(`\uFEFF${csvLine(header)}`));
      if (first.done) controller.close();
      else controller.enqueue(enc.encode(first.value.map(csvLine).join("")));
    },
    async pull(controller) {
      try {
        const { value, done } = await iterator.next();
        if (done) {
          controller.close();
          return;
        }
        controller.enqueue(enc.encode(value.map(csvLine).join("")));
      } catch (err) {
        console.error("[csv] export failed part-way", err);
        controller.error(err);
      }
    },
    async cancel() {
      await iterator.return?.(undefined);
    },
  });
  return new Response(stream, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${fileName.replace(/[^A-Za-z0-9._-]/g, "_")}"`,
      "Cache-Control": "no-store",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
