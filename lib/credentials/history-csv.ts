/**
 * The training history as CSV through lib/csv (RFC 4180 quoting and the OWASP formula guard): one
 * row per period total, per certificate and per completion, with the row kind in the first column.
 * Seat time (completion rows) is the server-measured reading time of the module's lessons, if any.
 */
import { isoDay } from "@/lib/dates";
import { csvLines, type CsvValue } from "@/lib/csv";
import { COUNTING_LABEL } from "./period";
import type { TrainingHistory } from "./history";

export const HISTORY_CSV_COLUMNS = [
  "Row",
  "Title",
  "Kind",
  "Date",
  "Valid until",
  "Status",
  "CE hours",
  "Reporting period",
  "Counted toward period",
  "Serial",
  "Verification code",
  "Verification URL",
  "Seat time (minutes)",
];

export function historyCsv(h: TrainingHistory): string {
  const rows: CsvValue[][] = [HISTORY_CSV_COLUMNS];
  for (const t of h.totals) rows.push(["Period total", h.person.name, "", isoDay(t.start), isoDay(new Date(t.end.getTime() - 1)), "", t.hours.toFixed(2), t.label, `${t.certificates} certificate(s)`, "", "", "", ""]);
  for (const c of h.certificates) {
    rows.push([
      "Certificate",
      c.subjectTitle,
      c.kind === "path" ? "Learning path" : "Module",
      isoDay(c.issuedAt),
      isoDay(c.expiresAt),
      c.status,
      c.ceHours.toFixed(2),
      c.period,
      COUNTING_LABEL[c.counting],
      c.serial,
      c.codeShown,
      c.verifyUrl,
      "",
    ]);
  }
  for (const m of h.completions) rows.push(["Completion", m.title, "Module", isoDay(m.completedAt), "", "completed", "", "", "", m.serial ?? "", "", "", m.seatMinutes === null ? "" : String(m.seatMinutes)]);
  return csvLines(rows);
}
