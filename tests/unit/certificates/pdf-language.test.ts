// The certificate PDF in the holder's language, read back with poppler's pdftotext: the fixed text
// is the Spanish catalog's (messages/es/certificatePdf.json), the dates are written the way CLDR's
// Spanish (United States) long date reads ("1 de diciembre de 2026"), the document language is
// es-US (ISO 32000-1 §14.9.2, the /Lang entry), and the figures (hours, serial, link) are unchanged.
import { PDFDocument, PDFName, PDFString } from "pdf-lib";
import { describe, expect, it } from "vitest";
import { renderCertificatePdf, type CertificatePdfData } from "@/lib/certificates/pdf";
import es from "@/messages/es/certificatePdf.json";
import { pdfText } from "../../helpers/pdf";

const code = "7KQ2M9XD3HTVA8RWEC6N4JPB5GFZ";
const verifyUrl = `https://riser.example/verify/${code}`;
const base: CertificatePdfData = {
  serial: "RSR-2026-000321",
  holderName: "Marisol Quintanar",
  organizationName: "Quillmoor Fire Protection",
  kind: "module",
  subjectTitle: "Hidráulica y el paquete del permiso",
  ceHours: 1.5,
  issuedAt: new Date("2026-12-01T15:00:00Z"),
  expiresAt: new Date("2028-12-01T15:00:00Z"),
  verificationCode: code,
  revokedAt: null,
};
const generatedAt = new Date("2026-12-02T08:00:00Z");
const flat = (s: string) => s.replace(/\s+/g, " ");

describe("certificate PDF in Spanish", () => {
  it("prints the Spanish fixed text, Spanish long dates and the same figures", async () => {
    const bytes = await renderCertificatePdf(base, { verifyUrl, generatedAt, locale: "es" });
    const text = flat(pdfText(bytes));
    for (const s of [es.headingModule, es.certifies, es.hours, es.issued, es.validUntil, "1 de diciembre de 2026", "1 de diciembre de 2028"]) expect(text).toContain(s);
    for (const s of ["Marisol Quintanar", "Hidráulica y el paquete del permiso", "1.5", "RSR-2026-000321", verifyUrl, "7KQ2-M9XD-3HTV-A8RW-EC6N-4JPB-5GFZ"]) expect(text).toContain(s);
    expect(text).not.toContain("CERTIFICATE OF COMPLETION");
    const doc = await PDFDocument.load(bytes, { updateMetadata: false });
    expect((doc.catalog.lookup(PDFName.of("Lang")) as PDFString).decodeText()).toBe("es-US");
  });

  it("says in Spanish that a revoked certificate is not valid", async () => {
    const text = flat(pdfText(await renderCertificatePdf({ ...base, revokedAt: new Date("2027-01-15T10:00:00Z") }, { verifyUrl, generatedAt, locale: "es" })));
    // the note above the (rotated) stamp, with the revocation day as CLDR's es-US long date
    expect(text).toContain(es.revokedNote.replace("{date}", "15 de enero de 2027"));
  });
});
