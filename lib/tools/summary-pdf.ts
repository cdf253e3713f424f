import "server-only";
/**
 * One-page PDF summary of a calculation, for a training file: inputs, formula, each step, result,
 * checks, sources, the caution and the date. The numbers are recomputed here from the inputs with
 * lib/hydraulics (the same `calculatorReport` the page shows), never taken from the browser.
 *
 * Fonts: Atkinson Hyperlegible (the app's body face) with DejaVu Sans for the few symbols it lacks
 * (→, superscript digits), and DejaVu Sans Mono for numbers — TTF files from npm packages, since
 * pdf-lib's fontkit embeds TTF reliably.
 */
import { readFile } from "node:fs/promises";
import path from "node:path";
import fontkit from "@pdf-lib/fontkit";
import { PDFDocument, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import {
  CALCULATOR_INFO,
  HydraulicsInputError,
  calculatorReport,
  isCalculatorId,
  type CalculatorId,
  type CalculatorReport,
} from "@/lib/hydraulics";

const FONT_FILES = {
  body: "@expo-google-fonts/atkinson-hyperlegible/400Regular/AtkinsonHyperlegible_400Regular.ttf",
  bold: "@expo-google-fonts/atkinson-hyperlegible/700Bold/AtkinsonHyperlegible_700Bold.ttf",
  fallback: "dejavu-fonts-ttf/ttf/DejaVuSans.ttf",
  fallbackBold: "dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf",
  mono: "dejavu-fonts-ttf/ttf/DejaVuSansMono.ttf",
  monoBold: "dejavu-fonts-ttf/ttf/DejaVuSansMono-Bold.ttf",
} as const;
type FontKey = keyof typeof FONT_FILES;

const fontCache = new Map<string, Promise<Uint8Array>>();
function fontBytes(dir: string, key: FontKey): Promise<Uint8Array> {
  const file = path.join(dir, FONT_FILES[key]);
  let p = fontCache.get(file);
  if (!p) {
    p = readFile(file).then((b) => new Uint8Array(b));
    fontCache.set(file, p);
  }
  return p;
}

// palette (tailwind.config.ts)
const INK = rgb(0x14 / 255, 0x20 / 255, 0x2b / 255);
const MUTED = rgb(0x56 / 255, 0x61 / 255, 0x6b / 255);
const LINE = rgb(0xd5 / 255, 0xcf / 255, 0xc3 / 255);
const COPPER = rgb(0x9a / 255, 0x4f / 255, 0x12 / 255);
const CAUTION = rgb(0xb4 / 255, 0x23 / 255, 0x18 / 255);
const CAUTION_LIGHT = rgb(0xfb / 255, 0xe4 / 255, 0xe1 / 255);
const PASS = rgb(0x2d / 255, 0x6a / 255, 0x2e / 255);

interface Fonts {
  body: PDFFont;
  bold: PDFFont;
  fallback: PDFFont;
  fallbackBold: PDFFont;
  mono: PDFFont;
  monoBold: PDFFont;
}

type Face = "body" | "bold" | "mono" | "monoBold";

/** split text into runs of one font: the face where it has the glyph, DejaVu otherwise */
function runs(fonts: Fonts, face: Face, text: string): { font: PDFFont; text: string }[] {
  const primary = fonts[face];
  if (face === "mono" || face === "monoBold") return [{ font: primary, text }];
  const fallback = face === "bold" ? fonts.fallbackBold : fonts.fallback;
  const supported = new Set(primary.getCharacterSet());
  const out: { font: PDFFont; text: string }[] = [];
  for (const ch of text) {
    const font = supported.has(ch.codePointAt(0) ?? 0) ? primary : fallback;
    const last = out[out.length - 1];
    if (last && last.font === font) last.text += ch;
    else out.push({ font, text: ch });
  }
  return out;
}

function measure(fonts: Fonts, face: Face, text: string, size: number): number {
  return runs(fonts, face, text).reduce((w, r) => w + r.font.widthOfTextAtSize(r.text, size), 0);
}

function wrap(fonts: Fonts, face: Face, text: string, size: number, width: number): string[] {
  const lines: string[] = [];
  for (const paragraph of text.split("\n")) {
    let line = "";
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      const next = line ? `${line} ${word}` : word;
      if (measure(fonts, face, next, size) <= width || !line) line = next;
      else {
        lines.push(line);
        line = word;
      }
    }
    lines.push(line);
  }
  return lines;
}

const PAGE = { width: 612, height: 792, margin: 40 }; // US Letter, points

interface Layout {
  fonts: Fonts;
  page: PDFPage | null;
  y: number;
  size: number;
}

function text(l: Layout, s: string, o: { face?: Face; size?: number; x?: number; width?: number; color?: ReturnType<typeof rgb>; gap?: number } = {}) {
  const face = o.face ?? "body";
  const size = o.size ?? l.size;
  const x = o.x ?? PAGE.margin;
  const width = o.width ?? PAGE.width - PAGE.margin - x;
  const lineHeight = size * 1.3;
  for (const line of wrap(l.fonts, face, s, size, width)) {
    l.y -= lineHeight;
    if (l.page) {
      let cx = x;
      for (const r of runs(l.fonts, face, line)) {
        l.page.drawText(r.text, { x: cx, y: l.y + size * 0.25, size, font: r.font, color: o.color ?? INK });
        cx += r.font.widthOfTextAtSize(r.text, size);
      }
    }
  }
  l.y -= o.gap ?? 0;
}

function heading(l: Layout, s: string) {
  l.y -= l.size * 0.5;
  text(l, s, { face: "bold", size: l.size * 1.15, color: COPPER, gap: 2 });
}

function rule(l: Layout) {
  l.y -= 4;
  l.page?.drawLine({ start: { x: PAGE.margin, y: l.y }, end: { x: PAGE.width - PAGE.margin, y: l.y }, thickness: 0.5, color: LINE });
  l.y -= 2;
}

/** a step or a result: label at the left, value at the right, working underneath */
function row(l: Layout, label: string, value: string, work?: string) {
  const valueWidth = Math.min(measure(l.fonts, "monoBold", value, l.size), 220);
  const right = PAGE.width - PAGE.margin;
  const startY = l.y;
  text(l, label, { width: right - PAGE.margin - valueWidth - 12 });
  const afterLabel = l.y;
  l.y = startY;
  text(l, value, { face: "monoBold", x: right - valueWidth, width: valueWidth + 1 });
  l.y = Math.min(afterLabel, l.y);
  if (work) text(l, work, { face: "mono", size: l.size * 0.85, color: MUTED, x: PAGE.margin + 10 });
}

function drawReport(l: Layout, report: CalculatorReport, date: Date) {
  const stamp = `${date.toISOString().slice(0, 10)} ${date.toISOString().slice(11, 16)} UTC`;
  text(l, "Riser · calculation summary", { face: "bold", size: l.size * 0.9, color: MUTED });
  text(l, report.title, { face: "bold", size: l.size * 1.8, gap: 2 });
  text(l, `${report.units === "si" ? "SI units (bar, L/min, m)" : "US units (psi, gpm, ft)"} · computed ${stamp}`, {
    size: l.size * 0.9,
    color: MUTED,
  });

  // caution first, boxed, so it cannot be missed
  const boxTop = l.y - 4;
  const measureOnly: Layout = { ...l, page: null, y: boxTop - 6 };
  text(measureOnly, `Caution: ${report.caution}`, { face: "bold", x: PAGE.margin + 8, width: PAGE.width - 2 * PAGE.margin - 16 });
  const boxBottom = measureOnly.y - 6;
  l.page?.drawRectangle({
    x: PAGE.margin,
    y: boxBottom,
    width: PAGE.width - 2 * PAGE.margin,
    height: boxTop - boxBottom,
    color: CAUTION_LIGHT,
    borderColor: CAUTION,
    borderWidth: 1,
  });
  l.y = boxTop - 6;
  text(l, `Caution: ${report.caution}`, { face: "bold", color: CAUTION, x: PAGE.margin + 8, width: PAGE.width - 2 * PAGE.margin - 16 });
  l.y = boxBottom - 4;

  heading(l, "Inputs");
  for (const i of report.inputs) row(l, i.label, i.text);

  heading(l, "Formula");
  for (const f of report.formula) text(l, f, { face: "mono", size: l.size * 0.9 });

  heading(l, "Steps");
  report.steps.forEach((s, i) => {
    row(l, `${i + 1}. ${s.label}`, s.text, s.work);
  });

  heading(l, "Result");
  for (const r of report.results) row(l, r.label, r.text);
  if (report.verdict) {
    text(l, `${report.verdict.result === "pass" ? "PASS" : "SHORT"}: ${report.verdict.text}`, {
      face: "bold",
      color: report.verdict.result === "pass" ? PASS : CAUTION,
      gap: 2,
    });
  }

  if (report.checks.length) {
    heading(l, "Check against the listing and the code");
    for (const c of report.checks) {
      text(l, `${c.status === "fails" ? "FAILS: " : c.status === "ok" ? "OK: " : "• "}${c.text}`, {
        size: l.size * 0.9,
        color: c.status === "fails" ? CAUTION : INK,
      });
    }
  }

  heading(l, "Where the numbers come from");
  for (const n of report.notes) text(l, `• ${n}`, { size: l.size * 0.85, color: MUTED });

  rule(l);
  text(
    l,
    "Recomputed by Riser's hydraulics library from the inputs above. Results are rounded for display (requirements up, supplies down). Keep with the training record; not a design submittal.",
    { size: l.size * 0.8, color: MUTED },
  );
}

export interface SummaryPdfOptions {
  date?: Date;
  /** folder holding the font packages (default: ./node_modules under the working directory) */
  fontDir?: string;
}

/** the summary PDF for a calculator and its inputs; throws HydraulicsInputError for bad input */
export async function calculatorSummaryPdf(id: string, input: unknown, options: SummaryPdfOptions = {}): Promise<Uint8Array> {
  if (!isCalculatorId(id)) throw new HydraulicsInputError("id", "unknown calculator");
  const report = calculatorReport(id, input);
  const date = options.date ?? new Date();
  const dir = options.fontDir ?? path.join(process.cwd(), "node_modules");

  const doc = await PDFDocument.create();
  doc.registerFontkit(fontkit);
  const embed = async (key: FontKey) => doc.embedFont(await fontBytes(dir, key), { subset: true });
  const fonts: Fonts = {
    body: await embed("body"),
    bold: await embed("bold"),
    fallback: await embed("fallback"),
    fallbackBold: await embed("fallbackBold"),
    mono: await embed("mono"),
    monoBold: await embed("monoBold"),
  };
  doc.setTitle(`${CALCULATOR_INFO[id as CalculatorId].title} — Riser calculation summary`);
  doc.setSubject("Calculation summary for a training file");
  doc.setCreator("Riser");
  doc.setProducer("Riser (pdf-lib)");
  doc.setCreationDate(date);
  doc.setModificationDate(date);

  // find the largest type size at which everything fits on one page
  let size = 10;
  for (; size > 6; size -= 0.5) {
    const l: Layout = { fonts, page: null, y: PAGE.height - PAGE.margin, size };
    drawReport(l, report, date);
    if (l.y >= PAGE.margin) break;
  }
  const page = doc.addPage([PAGE.width, PAGE.height]);
  drawReport({ fonts, page, y: PAGE.height - PAGE.margin, size }, report, date);
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
      return Response.json({ error: `${e.field}: ${e.reason}`, field: e.field }, { status: 400 });
    }
    throw e;
  }
}
