// lib/pdf: font fallback splitting and word wrap shared by the certificate and the calculator summary.
// Character coverage is checked against the font files themselves (Atkinson Hyperlegible has Latin
// letters with diacritics but no Greek; DejaVu Sans covers Greek and Cyrillic — from the fonts' own
// character maps, read through fontkit below).
import fontkit from "@pdf-lib/fontkit";
import { readFileSync } from "node:fs";
import path from "node:path";
import { PDFDocument } from "pdf-lib";
import { describe, expect, it } from "vitest";
import { C, FONT_FILES, createPdf, hexToRgb, splitRuns, wrapWords } from "@/lib/pdf";
import { palette } from "@/lib/theme/tokens";
import { pdfFonts, pdfText } from "../../helpers/pdf";

const dir = path.join(process.cwd(), "node_modules");
const atkinson = new Set(fontkit.create(readFileSync(path.join(dir, FONT_FILES.regular))).characterSet);
const covered = (cp: number) => atkinson.has(cp);

describe("splitRuns (font fallback)", () => {
  it("keeps Latin text, accents included, in the primary face as one run", () => {
    expect(splitRuns("Zoë Ñúñez-Łukasz", "regular", covered)).toEqual([{ text: "Zoë Ñúñez-Łukasz", key: "regular" }]);
  });

  it("hands characters the primary face lacks to DejaVu, bold to bold, in runs", () => {
    expect(atkinson.has("→".codePointAt(0)!)).toBe(false);
    expect(splitRuns("Step → 14.8", "bold", covered)).toEqual([
      { text: "Step ", key: "bold" },
      { text: "→", key: "fallbackBold" },
      { text: " 14.8", key: "bold" },
    ]);
    expect(splitRuns("Иван", "regular", covered)).toEqual([{ text: "Иван", key: "fallback" }]);
  });

  it("never splits the monospaced faces and turns control characters into spaces", () => {
    expect(splitRuns("Q = K·√P", "mono", covered)).toEqual([{ text: "Q = K·√P", key: "mono" }]);
    expect(splitRuns("a\tb\u0007c", "regular", covered)).toEqual([{ text: "a b c", key: "regular" }]);
  });
});

describe("wrapWords", () => {
  const chars = (s: string) => s.length; // one unit per character

  it("fills lines greedily and puts an over-long word on a line of its own", async () => {
    expect(await wrapWords("aa bb cc dd", 5, chars)).toEqual(["aa bb", "cc dd"]);
    expect(await wrapWords("a verylongword b", 5, chars)).toEqual(["a", "verylongword", "b"]);
    expect(await wrapWords("   ", 5, chars)).toEqual([]);
  });

  it("cuts to maxLines with an ellipsis that still fits", async () => {
    const lines = await wrapWords("one two three four five six", 9, chars, { maxLines: 2 });
    expect(lines).toHaveLength(2);
    expect(lines[0]).toBe("one two");
    expect(lines[1]!.endsWith("…")).toBe(true);
    expect(lines[1]!.length).toBeLessThanOrEqual(9);
  });

  it("keeps paragraph breaks when asked, an empty paragraph as an empty line", async () => {
    expect(await wrapWords("ab cd\n\nef", 10, chars, { keepBreaks: true })).toEqual(["ab cd", "", "ef"]);
    expect(await wrapWords("ab cd\n\nef", 10, chars)).toEqual(["ab cd ef"]);
  });
});

describe("Typesetter on a real document", () => {
  it("wraps by measured width and embeds DejaVu only for the text that needs it", async () => {
    const { doc, t } = await createPdf(dir);
    const page = doc.addPage([300, 200]);
    const width = 120;
    const lines = await t.wrap("Hydraulics and the permit package for a two-storey house", "regular", 12, width);
    expect(lines.length).toBeGreaterThan(1);
    for (const line of lines) expect(await t.width(line, "regular", 12)).toBeLessThanOrEqual(width);
    let y = 180;
    for (const line of lines) await t.draw(page, line, { x: 10, y: (y -= 14), size: 12 });
    const latin = await doc.save();
    expect(pdfFonts(latin).some((f) => f.startsWith("DejaVu"))).toBe(false);
    expect(pdfText(latin).replace(/\s+/g, " ")).toContain(lines.join(" "));

    const other = await createPdf(dir);
    await other.t.draw(other.doc.addPage([300, 200]), "Иван Петров", { x: 10, y: 20, size: 12 });
    const cyrillic = await other.doc.save();
    expect(pdfFonts(cyrillic)).toContain("DejaVuSans");
    expect(pdfText(cyrillic)).toContain("Иван Петров");
    expect((await PDFDocument.load(cyrillic)).getPageCount()).toBe(1);
  });

  it("shrinks text to fit a width in half-point steps, not below the minimum", async () => {
    const { t } = await createPdf(dir);
    const s = await t.fit("A rather long holder name", "bold", 36, 150, 10);
    expect(s).toBeLessThan(36);
    expect(await t.width("A rather long holder name", "bold", s)).toBeLessThanOrEqual(150);
    expect(await t.fit("A rather long holder name", "bold", 36, 5, 10)).toBe(10);
  });
});

describe("palette", () => {
  it("is the theme's tokens as PDF colours", () => {
    expect(hexToRgb("#FF8000")).toMatchObject({ red: 1, green: 128 / 255, blue: 0 });
    expect(C.ink).toEqual(hexToRgb(palette.ink));
    expect(() => hexToRgb("red")).toThrow();
  });
});
