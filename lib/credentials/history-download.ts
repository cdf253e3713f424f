import "server-only";
/** The training history of one person as a download (PDF or CSV) for a viewer allowed to see it. */
import type { Viewer } from "@/lib/access";
import { csvDownload } from "@/lib/csv";
import { DomainError } from "@/lib/errors";
import { historyFileName, historyPersonFor, trainingHistory } from "./history";
import { historyCsv } from "./history-csv";
import { renderHistoryPdf } from "./history-pdf";

export async function historyDownload(viewer: Viewer, personId: string, format: string | null): Promise<Response> {
  const f = format ?? "pdf";
  if (f !== "pdf" && f !== "csv") throw new DomainError("invalid", "Unknown format: ask for format=pdf (the printable document) or format=csv (the spreadsheet).");
  const person = await historyPersonFor(viewer, personId);
  const h = await trainingHistory(person);
  if (f === "csv") return csvDownload(historyFileName(person.name, "csv", h.generatedAt), historyCsv(h));
  const bytes = await renderHistoryPdf(h);
  return new Response(bytes as BodyInit, {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `attachment; filename="${historyFileName(person.name, "pdf", h.generatedAt)}"`,
      "Content-Length": String(bytes.byteLength),
      "Cache-Control": "private, no-store",
    },
  });
}
