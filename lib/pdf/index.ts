import "server-only";
/** Riser's PDF typesetting: fonts, text with font fallback, wrapping and the palette (pdf-lib). */
export { FONT_FILES, defaultFontDir } from "./fonts";
export { C, hexToRgb } from "./palette";
export { Typesetter, createPdf, splitRuns, wrapWords, type DrawOptions, type Face, type Run, type WrapOptions } from "./typesetter";
