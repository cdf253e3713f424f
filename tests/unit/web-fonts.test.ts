// The body face the pages load (app/_fonts/*.woff2, written by scripts/fonts.mjs) is the npm
// package's TTF compressed, not a different or cut-down font. Checked against the TTF itself:
// the WOFF2 header (W3C WOFF 2.0, section 3: signature "wOF2", flavor 0x00010000 for TrueType
// outlines), then the file decoded with Google's reference WOFF2 decoder (wawoff2) and both read
// with fontkit: the same glyphs, characters, metrics and outlines.
import { readFileSync } from "node:fs";
import path from "node:path";
import fontkit from "@pdf-lib/fontkit";
import { decompress } from "wawoff2";
import { describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../..");
const FACES = {
  AtkinsonHyperlegible_400Regular: "400Regular",
  AtkinsonHyperlegible_400Regular_Italic: "400Regular_Italic",
  AtkinsonHyperlegible_700Bold: "700Bold",
} as const;
// Latin text as lessons print it in both languages, with the symbols figures use
const SAMPLE = "Riser ¿Cuánto caudal? Señal «≤ 10 psi» ≥ √2 ≈ 1.41 — 13D “gpm” °F ½ ñ ü é";

describe("web fonts", () => {
  for (const [file, dir] of Object.entries(FACES)) {
    const ttfBytes = readFileSync(path.join(root, "node_modules/@expo-google-fonts/atkinson-hyperlegible", dir, `${file}.ttf`));
    const woff2Bytes = readFileSync(path.join(root, "app/_fonts", `${file}.woff2`));

    it(`${file}: a WOFF2 file of TrueType outlines, smaller than the TTF`, () => {
      expect(woff2Bytes.subarray(0, 4).toString("latin1")).toBe("wOF2");
      expect(woff2Bytes.readUInt32BE(4)).toBe(0x00010000);
      expect(woff2Bytes.length).toBeLessThan(ttfBytes.length);
    });

    it(`${file}: decodes to the same font as the package's TTF`, async () => {
      const ttf = fontkit.create(ttfBytes);
      const decoded = fontkit.create(Buffer.from(await decompress(woff2Bytes)));
      expect(decoded.postscriptName).toBe(ttf.postscriptName);
      expect(decoded.numGlyphs).toBe(ttf.numGlyphs);
      expect(decoded.unitsPerEm).toBe(ttf.unitsPerEm);
      expect([decoded.ascent, decoded.descent, decoded.lineGap]).toEqual([ttf.ascent, ttf.descent, ttf.lineGap]);
      expect(decoded.characterSet).toEqual(ttf.characterSet);
      for (const cp of [..."≤≥√≈ñ¿"].map((c) => c.codePointAt(0)!)) expect(decoded.hasGlyphForCodePoint(cp)).toBe(true);
      const a = ttf.layout(SAMPLE);
      const b = decoded.layout(SAMPLE);
      expect(b.glyphs.map((g) => g.id)).toEqual(a.glyphs.map((g) => g.id));
      expect(b.positions.map((p) => p.xAdvance)).toEqual(a.positions.map((p) => p.xAdvance));
      for (let i = 0; i < a.glyphs.length; i++) expect(b.glyphs[i]!.path.toSVG()).toBe(a.glyphs[i]!.path.toSVG());
    });
  }
});
