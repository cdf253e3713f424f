// Evidence files are judged by their bytes, photos lose their metadata, names never carry paths.
import { PDFDocument } from "pdf-lib";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { EvidenceError, PHOTO_MAX_EDGE, THUMB_EDGE, prepareEvidence, sanitiseFileName } from "@/lib/signoffs/evidence";
import { checkChosenFiles, MAX_UPLOAD_BYTES } from "@/lib/signoffs/schemas";
import { exifHasGps, jpegWithGps } from "../helpers/exif";

async function refusal(name: string, bytes: Uint8Array): Promise<EvidenceError> {
  const err = await prepareEvidence(name, bytes).then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(EvidenceError);
  return err as EvidenceError;
}

describe("sanitiseFileName", () => {
  it("keeps only the last path segment and drops path, quote and control characters", () => {
    expect(sanitiseFileName("../../etc/passwd.jpg")).toBe("passwd.jpg");
    expect(sanitiseFileName("..\\..\\windows\\win.ini.jpg")).toBe("win.ini.jpg");
    expect(sanitiseFileName('lot 14/"joint"\u0000\n.jpg')).toBe("joint.jpg");
    expect(sanitiseFileName("....hidden.png")).toBe("hidden.png");
    expect(sanitiseFileName("../")).toBe("evidence");
    expect(sanitiseFileName("x".repeat(400) + ".jpg").length).toBeLessThanOrEqual(120);
    expect(sanitiseFileName("Übergabe Prüfung.pdf")).toBe("Übergabe Prüfung.pdf");
  });
});

describe("prepareEvidence", () => {
  it("re-encodes a JPEG without its EXIF block (GPS position gone) and makes a thumbnail", async () => {
    const original = await jpegWithGps(4000, 3000);
    expect(exifHasGps((await sharp(original).metadata()).exif)).toBe(true); // the fixture really carries GPS
    const p = await prepareEvidence("IMG_0042.JPG", original);
    expect(p.contentType).toBe("image/jpeg");
    const meta = await sharp(p.body).metadata();
    expect(meta.exif).toBeUndefined();
    expect(exifHasGps(meta.exif)).toBe(false);
    expect(meta.xmp).toBeUndefined();
    expect(Math.max(meta.width!, meta.height!)).toBe(PHOTO_MAX_EDGE);
    const thumb = await sharp(p.thumbnail!).metadata();
    expect(thumb.format).toBe("jpeg");
    expect(Math.max(thumb.width!, thumb.height!)).toBe(THUMB_EDGE);
    expect(thumb.exif).toBeUndefined();
  });

  it("turns the pixels upright before dropping the orientation tag", async () => {
    // EXIF orientation 6 = "rotate 90° clockwise to display" (CIPA DC-008, Orientation tag 0x0112)
    const sideways = await sharp({ create: { width: 300, height: 200, channels: 3, background: "#1b617a" } }).jpeg().withMetadata({ orientation: 6 }).toBuffer();
    const p = await prepareEvidence("sideways.jpg", sideways);
    const meta = await sharp(p.body).metadata();
    expect([meta.width, meta.height]).toEqual([200, 300]);
    expect(meta.orientation).toBeUndefined();
  });

  it("keeps a PNG as PNG, without its text chunks", async () => {
    const png = await sharp({ create: { width: 120, height: 80, channels: 4, background: { r: 0, g: 0, b: 0, alpha: 0.5 } } })
      .png()
      .withMetadata()
      .withExif({ IFD0: { ImageDescription: "cure log" } })
      .toBuffer();
    const p = await prepareEvidence("log.png", png);
    expect(p.contentType).toBe("image/png");
    expect(p.displayName).toBe("log.png");
    expect((await sharp(p.body).metadata()).exif).toBeUndefined();
  });

  it("judges the type by content: text named .jpg is refused", async () => {
    const err = await refusal("joint.jpg", new TextEncoder().encode("this is not a photo, just text\n"));
    expect(err.status).toBe(415);
    expect(err.message).toMatch(/whatever its name says/);
  });

  it("refuses an empty file", async () => {
    const err = await refusal("empty.jpg", new Uint8Array(0));
    expect(err.status).toBe(400);
    expect(err.message).toMatch(/empty \(0 bytes\)/);
  });

  it("refuses a JPEG that was cut short", async () => {
    const whole = await jpegWithGps(800, 600);
    // keeps the SOI marker FFD8 (ITU-T T.81) so that the type still reads as JPEG
    const err = await refusal("half.jpg", whole.subarray(0, Math.floor(whole.length / 2)));
    expect(err.status).toBe(400);
    expect(err.message).toMatch(/damaged or cut short/);
  });

  it("refuses a HEIC photo it cannot decode with the message the learner needs", async () => {
    // ISO/IEC 23008-12 (HEIF): an "ftyp" box with major brand "heic"; no decodable image follows
    const heic = Buffer.concat([Buffer.from([0, 0, 0, 0x18]), Buffer.from("ftypheic"), Buffer.from([0, 0, 0, 0]), Buffer.from("mif1heic"), Buffer.alloc(64)]);
    const err = await refusal("IMG_1001.HEIC", heic);
    expect(err.status).toBe(415);
    expect(err.message).toMatch(/^HEIC photos cannot be read here — export as JPEG/);
  });

  it("accepts a whole PDF as it is and refuses one without its end-of-file marker", async () => {
    const doc = await PDFDocument.create();
    doc.addPage([612, 792]);
    const pdf = await doc.save();
    const p = await prepareEvidence("cure-log", pdf);
    expect(p.contentType).toBe("application/pdf");
    expect(p.thumbnail).toBeNull();
    expect(p.displayName).toBe("cure-log.pdf");
    expect(Buffer.from(p.body).equals(Buffer.from(pdf))).toBe(true);
    // ISO 32000-1 §7.5.5: a PDF file ends with "%%EOF"
    const err = await refusal("cut.pdf", pdf.subarray(0, pdf.length - 40));
    expect(err.status).toBe(400);
    expect(err.message).toMatch(/incomplete PDF/);
  });

  it("states the limits the same way in the browser check", () => {
    expect(checkChosenFiles([])).toMatch(/at least one/);
    expect(checkChosenFiles([{ name: "a.jpg", size: 0 }])).toMatch(/empty/);
    expect(checkChosenFiles([{ name: "a.jpg", size: MAX_UPLOAD_BYTES + 1 }])).toMatch(/8 MB in all/);
    expect(checkChosenFiles([1, 2, 3, 4].map((i) => ({ name: `${i}.jpg`, size: 10 })))).toMatch(/up to 3/);
    expect(checkChosenFiles([{ name: "a.jpg", size: 1000 }])).toBeNull();
  });
});
