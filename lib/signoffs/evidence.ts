import "server-only";
/**
 * Checks and prepares one uploaded evidence file before anything is stored:
 *  - the type comes from the bytes (file-type), never from the name or the browser's claim;
 *  - photos are decoded and re-encoded with sharp, which writes no metadata (EXIF with GPS
 *    position, camera serials, XMP, comments) unless asked to; the EXIF orientation is applied to
 *    the pixels first so that the photo still stands the right way up;
 *  - HEIC photos are converted to JPEG when this build of sharp can decode them, else refused;
 *  - each photo gets a small JPEG thumbnail; PDFs are stored as they are (no thumbnail).
 * Free of request and storage code so that unit tests can run it directly.
 */
import { fileTypeFromBuffer } from "file-type";
import sharp from "sharp";

export class EvidenceError extends Error {
  constructor(
    readonly status: 400 | 413 | 415 | 503,
    message: string,
  ) {
    super(message);
  }
}

export type PreparedEvidence = {
  kind: "photo" | "pdf";
  contentType: "image/jpeg" | "image/png" | "application/pdf";
  ext: "jpg" | "png" | "pdf";
  body: Uint8Array;
  thumbnail: Uint8Array | null;
  /** the sanitised original name, with the extension of what is stored */
  displayName: string;
  /** what the learner sent: "jpg", "png", "heic", "pdf" */
  receivedAs: string;
};

/** Longest edge kept for stored photos (enough to read a pipe marking or a gauge); thumbnails. */
export const PHOTO_MAX_EDGE = 3000;
export const THUMB_EDGE = 480;
/**
 * Photos above this many pixels are refused before decoding (a guard against decompression bombs
 * and memory exhaustion): 40 megapixels, above the largest common phone camera modes' default
 * output (12–24 MP; 48–50 MP sensors save binned 12 MP photos unless set otherwise).
 */
export const MAX_INPUT_PIXELS = 40_000_000;
const MAX_MP_LABEL = `${MAX_INPUT_PIXELS / 1_000_000} megapixels`;

/**
 * At most DECODE_SLOTS photos are decoded at once in this process (sharp holds whole images in
 * memory); up to DECODE_QUEUE more wait their turn, and beyond that the upload is refused with 503.
 */
export const DECODE_SLOTS = 2;
export const DECODE_QUEUE = 8;
const gate = { active: 0, waiting: [] as (() => void)[] };

async function withDecodeSlot<T>(fn: () => Promise<T>): Promise<T> {
  if (gate.active >= DECODE_SLOTS) {
    if (gate.waiting.length >= DECODE_QUEUE) {
      throw new EvidenceError(503, "Riser is busy preparing other people's photos. Nothing was saved; try again in a minute.");
    }
    await new Promise<void>((resolve) => gate.waiting.push(resolve));
  } else gate.active++;
  try {
    return await fn();
  } finally {
    const next = gate.waiting.shift();
    if (next) next(); // the slot passes straight to the next in line
    else gate.active--;
  }
}

/** For tests: how many decodes run and wait right now. */
export const decodeLoad = () => ({ active: gate.active, waiting: gate.waiting.length });

/**
 * A file name safe to show and to put in a Content-Disposition header: the last path segment only,
 * no control, quote or path characters, no leading dots, at most 120 characters. Never used in a key.
 */
export function sanitiseFileName(raw: string): string {
  const last = raw.split(/[/\\]/).pop() ?? "";
  const cleaned = last
    .normalize("NFKC")
    .replace(/[\u0000-\u001f\u007f"'`<>:|?*%;]/g, "")
    .replace(/\s+/g, " ")
    .replace(/[^\p{L}\p{N} ._()+,@#&=~!-]/gu, "_")
    .replace(/^[.\s_]+/, "")
    .replace(/\.{2,}/g, ".")
    .trim();
  const short = cleaned.length > 120 ? cleaned.slice(0, 60) + "…" + cleaned.slice(-59) : cleaned;
  return short || "evidence";
}

function withExt(name: string, ext: string): string {
  const base = name.replace(/\.[A-Za-z0-9]{1,5}$/, "");
  return `${base || "evidence"}.${ext}`;
}

const HEIC_REFUSAL =
  "HEIC photos cannot be read here — export as JPEG (most phones can save or share a photo as JPEG, or set the camera to its most compatible format) and upload it again.";

async function preparePhoto(bytes: Uint8Array, detectedExt: string, name: string): Promise<PreparedEvidence> {
  const heic = detectedExt === "heic" || detectedExt === "heif";
  let input: ReturnType<typeof sharp>;
  try {
    input = sharp(bytes, { failOn: "truncated", limitInputPixels: MAX_INPUT_PIXELS });
    const meta = await input.metadata(); // the header only: nothing is decoded yet
    if (!meta.width || !meta.height) throw new Error("no dimensions");
    if (meta.width * meta.height > MAX_INPUT_PIXELS) throw new Error("pixel limit");
  } catch (err) {
    const msg = err instanceof Error ? err.message : "";
    if (/pixel limit/i.test(msg)) throw new EvidenceError(413, `"${name}" has more than ${MAX_MP_LABEL}; save a smaller copy (or set the camera to a lower resolution) and upload that.`);
    if (heic) throw new EvidenceError(415, HEIC_REFUSAL);
    throw new EvidenceError(400, `"${name}" could not be read as a photo: it looks damaged or cut short. Take or export it again.`);
  }
  // PNG stays PNG (screenshots of records); JPEG and converted HEIC become JPEG.
  const asPng = detectedExt === "png";
  const upright = () => input.clone().rotate().resize({ width: PHOTO_MAX_EDGE, height: PHOTO_MAX_EDGE, fit: "inside", withoutEnlargement: true });
  try {
    const body = asPng ? await upright().png({ compressionLevel: 8 }).toBuffer() : await upright().jpeg({ quality: 85, mozjpeg: true }).toBuffer();
    const thumbnail = await input
      .clone()
      .rotate()
      .resize({ width: THUMB_EDGE, height: THUMB_EDGE, fit: "inside", withoutEnlargement: true })
      .flatten({ background: "#ffffff" })
      .jpeg({ quality: 75 })
      .toBuffer();
    const ext = asPng ? "png" : "jpg";
    return {
      kind: "photo",
      contentType: asPng ? "image/png" : "image/jpeg",
      ext,
      body: new Uint8Array(body),
      thumbnail: new Uint8Array(thumbnail),
      displayName: withExt(name, ext),
      receivedAs: detectedExt,
    };
  } catch {
    if (heic) throw new EvidenceError(415, HEIC_REFUSAL);
    throw new EvidenceError(400, `"${name}" could not be read as a photo: it looks damaged or cut short. Take or export it again.`);
  }
}

function preparePdf(bytes: Uint8Array, name: string): PreparedEvidence {
  // A PDF ends with "%%EOF" (possibly followed by line ends); without it the file was cut short.
  const tail = Buffer.from(bytes.subarray(Math.max(0, bytes.byteLength - 2048))).toString("latin1");
  if (!tail.includes("%%EOF")) throw new EvidenceError(400, `"${name}" is an incomplete PDF (its end is missing). Save or export it again.`);
  return { kind: "pdf", contentType: "application/pdf", ext: "pdf", body: bytes, thumbnail: null, displayName: withExt(name, "pdf"), receivedAs: "pdf" };
}

/** Checks one file by its content and prepares what will be stored; throws EvidenceError with a message for the learner. */
export async function prepareEvidence(rawName: string, bytes: Uint8Array): Promise<PreparedEvidence> {
  const name = sanitiseFileName(rawName);
  if (bytes.byteLength === 0) throw new EvidenceError(400, `"${name}" is empty (0 bytes). Choose the file again; if it came from a phone, let it finish saving first.`);
  const type = await fileTypeFromBuffer(bytes);
  switch (type?.ext) {
    case "jpg":
    case "png":
    case "heic":
      return withDecodeSlot(() => preparePhoto(bytes, type.ext, name));
    case "pdf":
      return preparePdf(bytes, name);
    default: {
      const what = type ? `a ${type.ext.toUpperCase()} file (${type.mime})` : "not a photo or PDF (it reads as text or an unknown format)";
      throw new EvidenceError(415, `"${name}" is ${what}, whatever its name says. Upload JPEG, PNG or HEIC photos, or a PDF.`);
    }
  }
}
