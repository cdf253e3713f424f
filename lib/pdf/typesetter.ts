import "server-only";
/**
 * Text on a pdf-lib page: per-character font fallback (Atkinson Hyperlegible where it has the glyph,
 * DejaVu Sans otherwise), measuring, shrink-to-fit, greedy word wrap and letter spacing. A font is
 * embedded (subset) only when some text needs it, so a Latin-only page carries no DejaVu at all.
 */
import { PDFDocument, setCharacterSpacing, type PDFFont, type PDFPage, type RGB } from "pdf-lib";
import { cachingFontkit, defaultFontDir, fontBytes, primaryCoverage, type FontFile } from "./fonts";
import { C } from "./palette";

export type Face = "regular" | "bold" | "mono" | "monoBold";
export type Run = { text: string; font: PDFFont };
export type DrawOptions = { x: number; y: number; size: number; face?: Face; color?: RGB; align?: "left" | "center" | "right"; spacing?: number };
export type WrapOptions = {
  /** at most this many lines, the last one shortened with an ellipsis */
  maxLines?: number;
  /** keep the text's own line breaks (each paragraph wraps on its own; an empty one is an empty line) */
  keepBreaks?: boolean;
};

/** Splits text into runs of one font file each: the face where `covered` says so, its fallback otherwise. */
export function splitRuns(text: string, face: Face, covered: (codePoint: number) => boolean): { text: string; key: FontFile }[] {
  const clean = text.replace(/[\u0000-\u001f\u007f]/g, " ");
  if (face === "mono" || face === "monoBold") return clean ? [{ text: clean, key: face }] : [];
  const out: { text: string; key: FontFile }[] = [];
  for (const ch of clean) {
    const key: FontFile = covered(ch.codePointAt(0)!) ? face : face === "bold" ? "fallbackBold" : "fallback";
    const last = out[out.length - 1];
    if (last && last.key === key) last.text += ch;
    else out.push({ text: ch, key });
  }
  return out;
}

/**
 * Greedy word wrap with any width function: words go on a line while it fits (a single word too
 * long for a line gets a line of its own); beyond `maxLines` the last line ends with "…".
 */
export async function wrapWords(text: string, maxWidth: number, width: (s: string) => number | Promise<number>, o: WrapOptions = {}): Promise<string[]> {
  const lines: string[] = [];
  for (const paragraph of o.keepBreaks ? text.split("\n") : [text]) {
    let line = "";
    for (const w of paragraph.split(/\s+/).filter(Boolean)) {
      const next = line ? `${line} ${w}` : w;
      if (!line || (await width(next)) <= maxWidth) line = next;
      else {
        lines.push(line);
        line = w;
      }
    }
    if (line || o.keepBreaks) lines.push(line);
  }
  const max = o.maxLines;
  if (max === undefined || lines.length <= max) return lines;
  const kept = lines.slice(0, max);
  let last = `${kept[max - 1]} ${lines.slice(max).join(" ")}`;
  while (last.length > 1 && (await width(`${last}…`)) > maxWidth) last = last.slice(0, -1);
  kept[max - 1] = `${last.trimEnd()}…`;
  return kept;
}

export class Typesetter {
  private fonts = new Map<FontFile, Promise<PDFFont>>();
  private covered: (cp: number) => boolean;
  constructor(
    readonly doc: PDFDocument,
    private dir: string,
    coverage: Set<number> = primaryCoverage(dir),
  ) {
    this.covered = (cp) => coverage.has(cp);
  }

  private font(key: FontFile): Promise<PDFFont> {
    let f = this.fonts.get(key);
    if (!f) {
      // no ligatures (text extraction stays letter by letter); no kerning, which pdf-lib does not apply
      f = this.doc.embedFont(fontBytes(this.dir, key), { subset: true, features: { liga: false, kern: false } });
      this.fonts.set(key, f);
    }
    return f;
  }

  /** The text as runs of one embedded font each. */
  async runs(text: string, face: Face): Promise<Run[]> {
    return Promise.all(splitRuns(text, face, this.covered).map(async (r) => ({ text: r.text, font: await this.font(r.key) })));
  }

  // widths scale with size: lay each run out once (shaping is the costly part of a page)
  private unitWidths = new Map<PDFFont, Map<string, number>>();
  private runWidth(font: PDFFont, text: string, size: number): number {
    let m = this.unitWidths.get(font);
    if (!m) this.unitWidths.set(font, (m = new Map()));
    let w = m.get(text);
    if (w === undefined) m.set(text, (w = font.widthOfTextAtSize(text, 1000) / 1000));
    return w * size;
  }

  async width(text: string, face: Face, size: number, spacing = 0): Promise<number> {
    let w = 0;
    for (const r of await this.runs(text, face)) w += this.runWidth(r.font, r.text, size);
    return w + spacing * Math.max(0, [...text].length - 1);
  }

  /** Largest size ≤ `size` (down to `min`, in half points) at which the text fits `maxWidth`. */
  async fit(text: string, face: Face, size: number, maxWidth: number, min = size * 0.5): Promise<number> {
    let s = size;
    while (s > min && (await this.width(text, face, s)) > maxWidth) s -= 0.5;
    return s;
  }

  /** Draws one line; returns the x where it ends. */
  async draw(page: PDFPage, text: string, o: DrawOptions): Promise<number> {
    const face = o.face ?? "regular";
    const runs = await this.runs(text, face);
    let x = o.x;
    if (o.align && o.align !== "left") {
      const w = await this.width(text, face, o.size, o.spacing);
      x = o.align === "center" ? o.x - w / 2 : o.x - w;
    }
    // letter-spaced small capitals use the PDF's own character spacing (Tc)
    if (o.spacing) page.pushOperators(setCharacterSpacing(o.spacing));
    for (const r of runs) {
      page.drawText(r.text, { x, y: o.y, size: o.size, font: r.font, color: o.color ?? C.ink });
      x += this.runWidth(r.font, r.text, o.size) + (o.spacing ?? 0) * [...r.text].length;
    }
    if (o.spacing) page.pushOperators(setCharacterSpacing(0));
    return x;
  }

  /** Greedy word wrap at this face and size (see `wrapWords`). */
  wrap(text: string, face: Face, size: number, maxWidth: number, o: WrapOptions = {}): Promise<string[]> {
    return wrapWords(text, maxWidth, (s) => this.width(s, face, size), o);
  }
}

/** A new document with Riser's fonts registered and a typesetter for it. */
export async function createPdf(fontDir = defaultFontDir()): Promise<{ doc: PDFDocument; t: Typesetter }> {
  const doc = await PDFDocument.create();
  doc.registerFontkit(cachingFontkit);
  return { doc, t: new Typesetter(doc, fontDir) };
}
