// Renders Riser's home-screen icons (public/icons/*.png) from lib/theme/app-icon.ts with sharp.
// Run after changing the mark or the palette: `npx tsx scripts/icons.ts`; the PNGs are committed.
import { mkdirSync } from "node:fs";
import path from "node:path";
import sharp from "sharp";
import { APP_ICONS, appIconSvg } from "@/lib/theme";

const dir = path.join(process.cwd(), "public", "icons");
mkdirSync(dir, { recursive: true });
for (const icon of APP_ICONS) {
  await sharp(Buffer.from(appIconSvg({ size: icon.size, maskable: icon.maskable })))
    .png({ compressionLevel: 9 })
    .toFile(path.join(dir, icon.file));
  console.log(`[icons] ${icon.file} ${icon.size}×${icon.size}`);
}
