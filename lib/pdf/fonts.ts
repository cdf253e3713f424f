import "server-only";
/**
 * Font files and parsed fonts shared by every PDF Riser draws.
 *
 * Fonts are TTF files from npm packages (pdf-lib's fontkit embeds TTF reliably):
 * Atkinson Hyperlegible, the app's body face, for everything it covers; DejaVu Sans for any run of
 * characters it lacks (Greek, Cyrillic, arrows, superscripts); DejaVu Sans Mono for codes and numbers.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import fontkit from "@pdf-lib/fontkit";
import type { PDFDocument } from "pdf-lib";

export const FONT_FILES = {
  regular: "@expo-google-fonts/atkinson-hyperlegible/400Regular/AtkinsonHyperlegible_400Regular.ttf",
  bold: "@expo-google-fonts/atkinson-hyperlegible/700Bold/AtkinsonHyperlegible_700Bold.ttf",
  fallback: "dejavu-fonts-ttf/ttf/DejaVuSans.ttf",
  fallbackBold: "dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf",
  mono: "dejavu-fonts-ttf/ttf/DejaVuSansMono.ttf",
  monoBold: "dejavu-fonts-ttf/ttf/DejaVuSansMono-Bold.ttf",
} as const;
export type FontFile = keyof typeof FONT_FILES;

/** Default folder of the font packages: ./node_modules under the working directory. */
export const defaultFontDir = () => path.join(/*turbopackIgnore: true*/ process.cwd(), "node_modules");

// Read once per process; a few hundred kB in memory.
const bytesCache = new Map<string, Uint8Array>();
export function fontBytes(dir: string, key: FontFile): Uint8Array {
  // the fonts live in node_modules, which the server keeps; no output tracing needed
  const file = path.join(/*turbopackIgnore: true*/ dir, FONT_FILES[key]);
  let b = bytesCache.get(file);
  if (!b) {
    b = new Uint8Array(readFileSync(/*turbopackIgnore: true*/ file));
    bytesCache.set(file, b);
  }
  return b;
}

/**
 * Parsed fonts, reused by every document: pdf-lib parses the font file for each embed, and most of
 * a page's time went into decoding the same tables again. A parsed fontkit font is read-only to
 * pdf-lib (each document makes its own subset), so one instance per file serves all documents.
 */
const parsedCache = new Map<Uint8Array, ReturnType<typeof fontkit.create>>();
export const cachingFontkit: Parameters<PDFDocument["registerFontkit"]>[0] = {
  create(buffer: Uint8Array) {
    let f = parsedCache.get(buffer);
    if (!f) {
      f = memoizeLayout(fontkit.create(buffer as Buffer));
      parsedCache.set(buffer, f);
    }
    return f;
  },
};

/**
 * Shaping (fontkit's layout) was the largest cost left, and most of a page's strings are the same in
 * every document. pdf-lib only reads the glyphs of a layout, never changes them, so a bounded memo
 * per font is safe.
 */
function memoizeLayout<F extends { layout: (text: string, features?: never) => unknown }>(font: F): F {
  const layout = font.layout.bind(font);
  const memo = new Map<string, unknown>();
  font.layout = ((text: string, features?: never) => {
    const key = `${JSON.stringify(features ?? null)}\u0000${text}`;
    let run = memo.get(key);
    if (run === undefined) {
      run = layout(text, features);
      if (memo.size >= 4000) memo.clear();
      memo.set(key, run);
    }
    return run;
  }) as F["layout"];
  return font;
}

// Code points Atkinson Hyperlegible has (regular and bold share a character set).
const coverageCache = new Map<string, Set<number>>();
export function primaryCoverage(dir: string): Set<number> {
  let s = coverageCache.get(dir);
  if (!s) {
    s = new Set(cachingFontkit.create(fontBytes(dir, "regular")).characterSet);
    coverageCache.set(dir, s);
  }
  return s;
}
