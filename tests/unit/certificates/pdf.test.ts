// The certificate PDF read back by outside tools: pdf-lib (structure and document information
// dictionary, ISO 32000-1 §14.3.3 — from memory), poppler's pdftotext and pdffonts (text and
// embedded fonts), and the QR code decoded by jsqr from the page rendered with pdftoppm.
import { PDFDocument } from "pdf-lib";
import { describe, expect, it } from "vitest";
import { renderCertificatePdf, type CertificatePdfData } from "@/lib/certificates/pdf";
import { pdfFonts, pdfText, qrFromPdf } from "../../helpers/pdf";

const code = "q3Z_9xTq-Lm0Rw8sVb2NcY7e";
const verifyUrl = `https://riser.example/verify/${code}`;
const base: CertificatePdfData = {
  serial: "RSR-2026-000123",
  holderName: "Zoë Ñúñez-Łukasz",
  organizationName: "Quillmoor Fire Protection",
  kind: "module",
  subjectTitle: "Hydraulics and the permit package",
  ceHours: 1.5,
  issuedAt: new Date("2026-12-01T15:00:00Z"),
  expiresAt: new Date("2028-12-01T15:00:00Z"),
  verificationCode: code,
  revokedAt: null,
};
const generatedAt = new Date("2026-12-02T08:00:00Z");

describe("certificate PDF", () => {
  it("is a one-page PDF with title, author, subject and creation date set", async () => {
    const bytes = await renderCertificatePdf(base, { verifyUrl, generatedAt });
    const doc = await PDFDocument.load(bytes, { updateMetadata: false });
    expect(doc.getPageCount()).toBe(1);
    const { width, height } = doc.getPage(0).getSize();
    expect([width, height]).toEqual([792, 612]); // US Letter landscape: 11 × 8.5 in at 72 pt/in
    expect(doc.getTitle()).toBe("Riser certificate RSR-2026-000123");
    expect(doc.getAuthor()).toBe("Riser");
    expect(doc.getSubject()).toContain("Hydraulics and the permit package");
    expect(doc.getSubject()).toContain("Zoë Ñúñez-Łukasz");
    expect(doc.getCreationDate()?.toISOString()).toBe(generatedAt.toISOString());
  });

  it("carries the holder's Unicode name, title, hours, dates, serial, organization and link as text", async () => {
    const text = pdfText(await renderCertificatePdf(base, { verifyUrl, generatedAt }));
    for (const s of ["Zoë Ñúñez-Łukasz", "Hydraulics and the permit package", "1.5", "RSR-2026-000123", "Quillmoor Fire Protection", "December 1, 2026", "December 1, 2028", verifyUrl]) {
      expect(text).toContain(s);
    }
    expect(text).toMatch(/Continuing-education hours/);
  });

  it("prints a new-style verification code in groups of four, as people type it", async () => {
    const newCode = "7KQ2M9XD3HTVA8RWEC6N4JPB5GFZ"; // 28 characters of the unambiguous alphabet
    const text = pdfText(await renderCertificatePdf({ ...base, verificationCode: newCode }, { verifyUrl: `https://riser.example/verify/${newCode}`, generatedAt }));
    expect(text).toContain("7KQ2-M9XD-3HTV-A8RW-EC6N-4JPB-5GFZ");
  });

  it("has a QR code that decodes to the verification URL (page rendered at 150 dpi)", async () => {
    const bytes = await renderCertificatePdf(base, { verifyUrl, generatedAt });
    expect(qrFromPdf(bytes, 150)).toBe(verifyUrl);
  });

  it("uses Atkinson Hyperlegible, and DejaVu Sans only for characters Atkinson lacks", async () => {
    const latin = pdfFonts(await renderCertificatePdf(base, { verifyUrl, generatedAt }));
    expect(latin.some((f) => f.startsWith("AtkinsonHyperlegible"))).toBe(true);
    expect(latin.some((f) => f === "DejaVuSans" || f === "DejaVuSans-Bold")).toBe(false);

    const name = "Ξένια Жукова-Brannock"; // Greek and Cyrillic: not in Atkinson Hyperlegible's character set
    const bytes = await renderCertificatePdf({ ...base, holderName: name }, { verifyUrl, generatedAt });
    expect(pdfFonts(bytes)).toContain("DejaVuSans-Bold");
    expect(pdfText(bytes)).toContain(name);
  });

  it("prints a path's modules, the renewed serial, and a revoked stamp", async () => {
    const bytes = await renderCertificatePdf(
      { ...base, kind: "path", subjectTitle: "Builder sales", ceHours: 3.5, renewsSerial: "RSR-2024-000041", parts: ["How a home sprinkler system works", "Talking with homebuyers"], revokedAt: new Date("2027-02-03T10:00:00Z") },
      { verifyUrl, generatedAt },
    );
    const text = pdfText(bytes);
    expect(text).toContain("LEARNING PATH CERTIFICATE");
    expect(text).toContain("Talking with homebuyers");
    expect(text).toContain("Renews certificate RSR-2024-000041");
    expect(text).toContain("Revoked on February 3, 2027");
    expect(qrFromPdf(bytes)).toBe(verifyUrl);
  });

  it("shrinks a very long name to fit instead of running off the page", async () => {
    const long = "Maximiliana Wilhelmina Theodora Featherstonehaugh-Cholmondeley-Marjoribanks";
    const bytes = await renderCertificatePdf({ ...base, holderName: long }, { verifyUrl, generatedAt });
    const text = pdfText(bytes);
    expect(text.replace(/\s+/g, " ")).toContain(long);
  });

  it("stays small with embedded fonts (target: under 150 kB)", async () => {
    const bytes = await renderCertificatePdf(base, { verifyUrl, generatedAt });
    expect(bytes.byteLength).toBeLessThan(150 * 1024);
  });
});
