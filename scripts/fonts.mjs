#!/usr/bin/env node
// node scripts/fonts.mjs: writes the body face the pages load (app/_fonts/*.woff2) from the TTF
// files of the npm font package. WOFF2 is the same font (every glyph, metric and table) compressed
// with Brotli: about 23 kB a face instead of about 30 kB for the TTF sent gzipped, so the three
// faces every page preloads cost the phone about 20 kB less before the first text can show.
// The PDFs keep the TTFs (lib/pdf/fonts.ts). tests/unit/fonts.test.ts checks the files against
// their TTF sources; run this again after updating the font package.
import { readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { compress } from "wawoff2";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const BODY_FACES = [
  "400Regular/AtkinsonHyperlegible_400Regular",
  "400Regular_Italic/AtkinsonHyperlegible_400Regular_Italic",
  "700Bold/AtkinsonHyperlegible_700Bold",
];

for (const face of BODY_FACES) {
  const ttf = readFileSync(path.join(root, "node_modules/@expo-google-fonts/atkinson-hyperlegible", `${face}.ttf`));
  const out = path.join(root, "app/_fonts", `${path.basename(face)}.woff2`);
  const woff2 = Buffer.from(await compress(ttf));
  writeFileSync(out, woff2);
  console.log(`${path.relative(root, out)}: ${ttf.length} → ${woff2.length} bytes`);
}
