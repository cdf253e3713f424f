import "server-only";
/**
 * One-page PDF summary of a calculation, for a training file: inputs, formula, each step, result,
 * checks, sources, the caution and the date. The numbers are recomputed here from the inputs with
 * lib/hydraulics (the same `calculatorReport` the page shows), never taken from the browser.
 *
 * Typesetting comes from lib/pdf: Atkinson Hyperlegible (the app's body face) with DejaVu Sans for
 * the few symbols it lacks (→, superscript digits), and DejaVu Sans Mono for numbers.
 */
import type { PDFPage, RGB } from "pdf-lib";
import { C, createPdf, defaultFontDir, type Face, type Typesetter } from "@/lib/pdf";
import {
  HydraulicsInputError,
  inputErrorSentence,
  calculatorReport,
  isCalculatorId,
  type CalculatorId,
  type CalculatorReport,
} from "@/lib/hydraulics";
import { utcStamp } from "@/lib/dates";
import { catalogTranslator, storedLocale, type CatalogT } from "@/lib/i18n";

const PAGE = { width: 612, height: 792, margin: 40 }; // US Letter, points

interface Layout {
  t: Typesetter;
  page: PDFPage | null;
  y: number;
  size: number;
}

async function text(l: Layout, s: string, o: { face?: Face; size?: number; x?: number; width?: number; color?: RGB; gap?: number } = {}) {
  const face = o.face ?? "regular";
  const size = o.size ?? l.size;
  const x = o.x ?? PAGE.margin;
  const width = o.width ?? PAGE.width - PAGE.margin - x;
  const lineHeight = size * 1.3;
  for (const line of await l.t.wrap(s, face, size, width, { keepBreaks: true })) {
    l.y -= lineHeight;
    if (l.page) await l.t.draw(l.page, line, { x, y: l.y + size * 0.25, size, face, color: o.color ?? C.ink });
  }
  l.y -= o.gap ?? 0;
}

async function heading(l: Layout, s: string) {
  l.y -= l.size * 0.5;
  await text(l, s, { face: "bold", size: l.size * 1.15, color: C.copper, gap: 2 });
}

function rule(l: Layout) {
  l.y -= 4;
  l.page?.drawLine({ start: { x: PAGE.margin, y: l.y }, end: { x: PAGE.width - PAGE.margin, y: l.y }, thickness: 0.5, color: C.line });
  l.y -= 2;
}

/** a step or a result: label at the left, value at the right, working underneath */
async function row(l: Layout, label: string, value: string, work?: string) {
  const valueWidth = Math.min(await l.t.width(value, "monoBold", l.size), 220);
  const right = PAGE.width - PAGE.margin;
  const startY = l.y;
  await text(l, label, { width: right - PAGE.margin - valueWidth - 12 });
  const afterLabel = l.y;
  l.y = startY;
  await text(l, value, { face: "monoBold", x: right - valueWidth, width: valueWidth + 1 });
  l.y = Math.min(afterLabel, l.y);
  if (work) await text(l, work, { face: "mono", size: l.size * 0.85, color: C.muted, x: PAGE.margin + 10 });
}

async function drawReport(l: Layout, report: CalculatorReport, date: Date, tr: CatalogT) {
  const stamp = utcStamp(date);
  await text(l, tr("pdf.kicker"), { face: "bold", size: l.size * 0.9, color: C.muted });
  await text(l, tr(`info.${report.id}.title`), { face: "bold", size: l.size * 1.8, gap: 2 });
  await text(l, tr("pdf.unitsLine", { units: report.units, stamp }), {
    size: l.size * 0.9,
    color: C.muted,
  });

  // caution first, boxed, so it cannot be missed
  const boxTop = l.y - 4;
  const measureOnly: Layout = { ...l, page: null, y: boxTop - 6 };
  await text(measureOnly, tr("pdf.caution", { text: tr("caution") }), { face: "bold", x: PAGE.margin + 8, width: PAGE.width - 2 * PAGE.margin - 16 });
  const boxBottom = measureOnly.y - 6;
  l.page?.drawRectangle({
    x: PAGE.margin,
    y: boxBottom,
    width: PAGE.width - 2 * PAGE.margin,
    height: boxTop - boxBottom,
    color: C["caution-light"],
    borderColor: C.caution,
    borderWidth: 1,
  });
  l.y = boxTop - 6;
  await text(l, tr("pdf.caution", { text: tr("caution") }), { face: "bold", color: C.caution, x: PAGE.margin + 8, width: PAGE.width - 2 * PAGE.margin - 16 });
  l.y = boxBottom - 4;

  await heading(l, tr("pdf.inputs"));
  for (const i of report.inputs) await row(l, i.label, i.text);

  await heading(l, tr("formula"));
  for (const f of report.formula) await text(l, f, { face: "mono", size: l.size * 0.9 });

  await heading(l, tr("pdf.steps"));
  for (const [i, s] of report.steps.entries()) await row(l, `${i + 1}. ${s.label}`, s.text, s.work);

  await heading(l, tr("result"));
  for (const r of report.results) await row(l, r.label, r.text);
  if (report.verdict) {
    await text(l, `${report.verdict.result === "pass" ? tr("pdf.pass") : tr("pdf.short")}: ${report.verdict.text}`, {
      face: "bold",
      color: report.verdict.result === "pass" ? C.pass : C.caution,
      gap: 2,
    });
  }

  if (report.checks.length) {
    await heading(l, tr("checks"));
    for (const c of report.checks) {
      await text(l, `${c.status === "fails" ? tr("pdf.fails") : c.status === "ok" ? tr("statusOk") : "• "}${c.text}`, {
        size: l.size * 0.9,
        color: c.status === "fails" ? C.caution : C.ink,
      });
    }
  }

  await heading(l, tr("sources"));
  for (const n of report.notes) await text(l, `• ${n}`, { size: l.size * 0.85, color: C.muted });

  rule(l);
  await text(
    l,
    tr("pdf.footer"),
    { size: l.size * 0.8, color: C.muted },
  );
}

export interface SummaryPdfOptions {
  date?: Date;
  /** folder holding the font packages (default: ./node_modules under the working directory) */
  fontDir?: string;
  /** the reader's language ("en" or "es"); the figures, units and sources are the same in both */
  language?: string;
}

/** the summary PDF for a calculator and its inputs; throws HydraulicsInputError for bad input */
export async function calculatorSummaryPdf(id: string, input: unknown, options: SummaryPdfOptions = {}): Promise<Uint8Array> {
  if (!isCalculatorId(id)) throw new HydraulicsInputError("id", "unknown calculator");
  const report = calculatorReport(id, input, catalogTranslator(options.language, "calcReports"));
  const date = options.date ?? new Date();
  const { doc, t } = await createPdf(options.fontDir ?? defaultFontDir());
  const tr = catalogTranslator(options.language, "tools");
  doc.setTitle(tr("pdf.docTitle", { title: tr(`info.${id as CalculatorId}.title`) }));
  doc.setSubject("Calculation summary for a training file");
  doc.setCreator("Riser");
  doc.setProducer("Riser (pdf-lib)");
  doc.setCreationDate(date);
  doc.setModificationDate(date);

  // find the largest type size at which everything fits on one page
  let size = 10;
  for (; size > 6; size -= 0.5) {
    const l: Layout = { t, page: null, y: PAGE.height - PAGE.margin, size };
    await drawReport(l, report, date, tr);
    if (l.y >= PAGE.margin) break;
  }
  const page = doc.addPage([PAGE.width, PAGE.height]);
  await drawReport({ t, page, y: PAGE.height - PAGE.margin, size }, report, date, tr);
  return doc.save();
}

/**
 * Route handler body for POST { id, input } → application/pdf (or 400 with the field at fault).
 * The lead wires it as: `export const POST = (req: Request) => summaryPdfResponse(req);`
 */
export async function summaryPdfResponse(request: Request, options: SummaryPdfOptions = {}): Promise<Response> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    return Response.json({ error: "Send JSON: { id, input }." }, { status: 400 });
  }
  const { id, input } = (body ?? {}) as { id?: unknown; input?: unknown };
  if (!isCalculatorId(id)) return Response.json({ error: "Unknown calculator.", field: "id" }, { status: 400 });
  try {
    const pdf = await calculatorSummaryPdf(id, input, options);
    return new Response(pdf as BodyInit, {
      status: 200,
      headers: {
        "content-type": "application/pdf",
        "content-disposition": `attachment; filename="riser-${id}-summary.pdf"`,
        "cache-control": "no-store",
      },
    });
  } catch (e) {
    if (e instanceof HydraulicsInputError) {
      // English keeps the library's own words; another language gets the form's sentence in its catalog
      const error = storedLocale(options.language) === "en" ? `${e.field}: ${e.reason}` : inputErrorSentence(e, catalogTranslator(options.language, "calcReports"));
      return Response.json({ error, field: e.field }, { status: 400 });
    }
    throw e;
  }
}
