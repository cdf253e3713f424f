/**
 * Reading PDFs the way an outside tool does: text and fonts with Debian's poppler-utils
 * (pdftotext, pdffonts), the first page rendered to PNG with pdftoppm and its QR code decoded with
 * jsqr (a general-purpose ISO/IEC 18004 decoder). Used by certificate tests.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createRequire } from "node:module";
import jsQR from "jsqr";

// pngjs ships no types; this is the one call used here
type PngSync = { sync: { read(buf: Buffer): { width: number; height: number; data: Buffer } } };
const { PNG } = createRequire(import.meta.url)("pngjs") as { PNG: PngSync };

function withPdf<T>(bytes: Uint8Array, fn: (file: string, dir: string) => T): T {
  const dir = mkdtempSync(path.join(tmpdir(), "riser-pdf-"));
  try {
    const file = path.join(dir, "doc.pdf");
    writeFileSync(file, bytes);
    return fn(file, dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export function pdfText(bytes: Uint8Array): string {
  return withPdf(bytes, (file) => execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" }));
}

/** Font names embedded in the PDF (subset tags like "ABCDEF+" or pdf-lib's "-1234" removed). */
export function pdfFonts(bytes: Uint8Array): string[] {
  const out = withPdf(bytes, (file) => execFileSync("pdffonts", [file], { encoding: "utf8" }));
  return out
    .split("\n")
    .slice(2)
    .map((l) => l.trim().split(/\s+/)[0] ?? "")
    .filter(Boolean)
    .map((n) => n.replace(/^[A-Z]{6}\+/, "").replace(/-\d{4}$/, ""));
}

/** Renders page 1 at `dpi` and decodes the first QR code found on it (null when none). */
export function qrFromPdf(bytes: Uint8Array, dpi = 150): string | null {
  return withPdf(bytes, (file, dir) => {
    execFileSync("pdftoppm", ["-png", "-r", String(dpi), "-f", "1", "-l", "1", "-singlefile", file, path.join(dir, "page")]);
    const png = PNG.sync.read(readFileSync(path.join(dir, "page.png")));
    const code = jsQR(new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.byteLength), png.width, png.height);
    return code?.data ?? null;
  });
}
