import "server-only";
/**
 * The certificate as a one-page PDF (US Letter, landscape), drawn with pdf-lib.
 *
 * Fonts, font fallback, wrapping and colours come from lib/pdf: Atkinson Hyperlegible with DejaVu Sans
 * for any run of characters it lacks, so that any Latin, Greek or Cyrillic name prints. DejaVu is
 * embedded only when a text needs it. Every font is subset, which keeps a page near 40 kB.
 *
 * This module needs no database or environment: callers pass the data and the verification URL.
 * The fixed text comes from the message catalogs ("certificatePdf") in the holder's language.
 */
import { createTranslator } from "use-intl/core";
import { degrees, type PDFPage } from "pdf-lib";
import QRCode from "qrcode";
import { C, createPdf, defaultFontDir } from "@/lib/pdf";
import { palette } from "@/lib/theme";
import { INTL_TAG, type Locale } from "@/lib/i18n/browser";
import { loadMessages } from "@/lib/i18n";
import { formatHours, type CertificateKind } from "./status";
import { formatVerificationCode } from "./verify-code";

export type CertificatePdfData = {
  serial: string;
  holderName: string;
  organizationName: string | null;
  kind: CertificateKind;
  subjectTitle: string;
  ceHours: number;
  issuedAt: Date;
  expiresAt: Date;
  verificationCode: string;
  revokedAt: Date | null;
  /** serial of the certificate this one renews */
  renewsSerial?: string | null;
  /** for a path: the titles of its modules */
  parts?: string[];
  /** the NFPA 13D edition the material was taught to (module certificates) */
  edition?: number | null;
};

export type CertificatePdfOptions = {
  verifyUrl: string;
  /** the document's creation date (default: now) */
  generatedAt?: Date;
  /** folder holding the font packages (default: ./node_modules under the working directory) */
  fontDir?: string;
  /** the holder's language: the fixed text and the dates (default English); titles come in `data` already */
  locale?: Locale;
};

const PAGE = { width: 792, height: 612 }; // US Letter landscape, points
const BAND = 196; // dark band on the left
const LEFT = BAND + 44; // text column
const RIGHT = PAGE.width - 48;

/** Riser's mark, large: a vertical pipe with its deflector at the top and a gauge beside it. */
function drawMark(page: PDFPage, x: number, y: number, scale: number) {
  page.drawRectangle({ x: x + 12 * scale, y: y - 26 * scale, width: 4 * scale, height: 20 * scale, color: C["copper-bright"] });
  page.drawLine({ start: { x: x + 6 * scale, y: y - 5 * scale }, end: { x: x + 22 * scale, y: y - 5 * scale }, thickness: 2.5 * scale, color: C.paper });
  page.drawLine({ start: { x: x + 14 * scale, y: y - 5 * scale }, end: { x: x + 14 * scale, y: y - 2 * scale }, thickness: 2 * scale, color: C.paper });
  page.drawCircle({ x: x + 20 * scale, y: y - 15 * scale, size: 3.5 * scale, borderColor: C.paper, borderWidth: 2 * scale });
  page.drawLine({ start: { x: x + 16 * scale, y: y - 15 * scale }, end: { x: x + 16.5 * scale, y: y - 15 * scale }, thickness: 2 * scale, color: C.paper });
}

/** The certificate PDF's bytes. */
export async function renderCertificatePdf(data: CertificatePdfData, options: CertificatePdfOptions): Promise<Uint8Array> {
  const generatedAt = options.generatedAt ?? new Date();
  const { doc, t } = await createPdf(options.fontDir ?? defaultFontDir());
  const locale = options.locale ?? "en";
  const m = createTranslator({ locale: INTL_TAG[locale], messages: loadMessages(locale), namespace: "certificatePdf" }) as unknown as (
    key: string,
    values?: Record<string, string | number>,
  ) => string;
  const dateFormat = new Intl.DateTimeFormat(INTL_TAG[locale], { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" });
  const formatCertificateDate = (d: Date) => dateFormat.format(d);
  const kindWord = data.kind === "path" ? m("kindPath") : m("kindModule");

  doc.setTitle(m("docTitle", { serial: data.serial }), { showInWindowTitleBar: true });
  doc.setAuthor("Riser");
  doc.setSubject(m("docSubject", { title: data.subjectTitle, kind: kindWord, name: data.holderName }));
  doc.setKeywords([data.serial, m("keywordCertificate"), m("keywordCe"), m("keywordSprinklers")]);
  doc.setCreator("Riser");
  doc.setProducer("Riser (pdf-lib)");
  doc.setLanguage(INTL_TAG[locale]);
  doc.setCreationDate(generatedAt);
  doc.setModificationDate(generatedAt);

  const page = doc.addPage([PAGE.width, PAGE.height]);
  page.drawRectangle({ x: 0, y: 0, width: PAGE.width, height: PAGE.height, color: C.paper });

  // ----- the band: mark, name, QR code -----
  page.drawRectangle({ x: 0, y: 0, width: BAND, height: PAGE.height, color: C.ink });
  page.drawRectangle({ x: BAND, y: 0, width: 5, height: PAGE.height, color: C["copper-bright"] });
  drawMark(page, 34, PAGE.height - 40, 2.2);
  await t.draw(page, "Riser", { x: 34, y: PAGE.height - 128, size: 30, face: "bold", color: C.paper });
  await t.draw(page, m("tagline1"), { x: 34, y: PAGE.height - 150, size: 10.5, color: C.line });
  await t.draw(page, m("tagline2"), { x: 34, y: PAGE.height - 164, size: 10.5, color: C.line });

  const qrSize = 128;
  const qrX = (BAND - qrSize) / 2;
  const qrY = 92;
  const png = await QRCode.toBuffer(options.verifyUrl, {
    type: "png",
    errorCorrectionLevel: "M",
    margin: 3,
    scale: 4,
    color: { dark: `${palette.ink}FF`, light: `${palette.panel}FF` },
    // RGB without alpha and no filter search: a smaller image that pdf-lib embeds without a mask
    rendererOpts: { deflateLevel: 6, filterType: 0, colorType: 2 } as { deflateLevel: number },
  });
  const qr = await doc.embedPng(png);
  page.drawRectangle({ x: qrX - 4, y: qrY - 4, width: qrSize + 8, height: qrSize + 8, color: C.panel });
  page.drawImage(qr, { x: qrX, y: qrY, width: qrSize, height: qrSize });
  await t.draw(page, m("scan1"), { x: BAND / 2, y: qrY - 24, size: 10.5, face: "bold", color: C.paper, align: "center" });
  await t.draw(page, m("scan2"), { x: BAND / 2, y: qrY - 38, size: 10.5, face: "bold", color: C.paper, align: "center" });

  // ----- the text column -----
  const width = RIGHT - LEFT;
  let y = PAGE.height - 78;
  const heading = data.kind === "path" ? m("headingPath") : m("headingModule");
  await t.draw(page, heading, { x: LEFT, y, size: 12, face: "bold", color: C.copper, spacing: 2.2 });
  const serialSize = await t.fit(data.serial, "mono", 12, 170, 8);
  const serialEnd = await t.draw(page, data.serial, { x: RIGHT, y, size: serialSize, face: "mono", color: C.ink, align: "right" });
  const serialW = await t.width(data.serial, "mono", serialSize);
  await t.draw(page, m("serial"), { x: serialEnd - serialW - 8, y, size: 9, color: C.muted, align: "right" });
  y -= 14;
  page.drawLine({ start: { x: LEFT, y }, end: { x: LEFT + 64, y }, thickness: 3, color: C["copper-bright"] });

  y -= 44;
  await t.draw(page, m("certifies"), { x: LEFT, y, size: 13, color: C.muted });
  y -= 42;
  // a name shrinks to 22 pt, then takes two lines (each shrunk further only if one word is too long)
  const nameSize = await t.fit(data.holderName, "bold", 36, width, 22);
  const nameLines = (await t.width(data.holderName, "bold", nameSize)) <= width ? [data.holderName] : await t.wrap(data.holderName, "bold", 22, width, { maxLines: 2 });
  for (const [i, line] of nameLines.entries()) {
    if (i > 0) y -= 26;
    const size = nameLines.length > 1 ? await t.fit(line, "bold", 22, width, 10) : nameSize;
    await t.draw(page, line, { x: LEFT, y, size, face: "bold", color: C.ink });
  }
  if (data.organizationName) {
    y -= 22;
    const ofOrg = m("ofOrganization", { organization: data.organizationName });
    const orgSize = await t.fit(ofOrg, "regular", 13, width, 9);
    await t.draw(page, ofOrg, { x: LEFT, y, size: orgSize, color: C.muted });
  }
  y -= 34;
  const lead = data.kind === "path" ? m("leadPath") : m("leadModule");
  await t.draw(page, lead, { x: LEFT, y, size: 13, color: C.muted });
  y -= 30;
  for (const line of await t.wrap(data.subjectTitle, "bold", 24, width, { maxLines: 2 })) {
    await t.draw(page, line, { x: LEFT, y, size: 24, face: "bold", color: C.water });
    y -= 29;
  }
  if (data.parts?.length) {
    const partLines = await t.wrap(m("modules", { list: data.parts.join(" · ") }), "regular", 9.5, width, { maxLines: 3 });
    for (const line of partLines) {
      await t.draw(page, line, { x: LEFT, y: y + 6, size: 9.5, color: C.muted });
      y -= 12.5;
    }
    y -= 4;
  }
  if (data.edition) {
    await t.draw(page, m("edition", { edition: String(data.edition) }), { x: LEFT, y: y + 6, size: 9.5, color: C.muted });
    y -= 16;
  }

  // details panel: hours, dates, serial
  const panelH = 66;
  const panelY = Math.min(y - panelH + 4, 226);
  page.drawRectangle({ x: LEFT, y: panelY, width, height: panelH, color: C.panel, borderColor: C.line, borderWidth: 1 });
  const cells: { label: string; value: string; w: number }[] = [
    { label: m("hours"), value: formatHours(data.ceHours), w: 0.34 },
    { label: m("issued"), value: formatCertificateDate(data.issuedAt), w: 0.33 },
    { label: m("validUntil"), value: formatCertificateDate(data.expiresAt), w: 0.33 },
  ];
  let cx = LEFT;
  for (const [i, cell] of cells.entries()) {
    const cellW = width * cell.w;
    if (i > 0) page.drawLine({ start: { x: cx, y: panelY + 12 }, end: { x: cx, y: panelY + panelH - 12 }, thickness: 1, color: C.line });
    await t.draw(page, cell.label, { x: cx + 16, y: panelY + panelH - 24, size: 9.5, color: C.muted });
    const vs = await t.fit(cell.value, "bold", 17, cellW - 28, 9);
    await t.draw(page, cell.value, { x: cx + 16, y: panelY + 17, size: vs, face: "bold", color: C.ink });
    cx += cellW;
  }

  // verification
  let vy = panelY - 34;
  await t.draw(page, m("checkAt"), { x: LEFT, y: vy, size: 11, color: C.ink });
  vy -= 18;
  const urlSize = await t.fit(options.verifyUrl, "mono", 11, width, 6);
  await t.draw(page, options.verifyUrl, { x: LEFT, y: vy, size: urlSize, face: "mono", color: C.water });
  vy -= 16;
  const extra = data.renewsSerial ? `  ·  ${m("renews", { serial: data.renewsSerial })}` : "";
  await t.draw(page, `${m("verificationCode", { code: formatVerificationCode(data.verificationCode) })}${extra}`, { x: LEFT, y: vy, size: 9, face: "mono", color: C.muted });

  // fine print (honest about what the hours mean and who decides)
  const fine = [m("fine1"), m("fine2"), m("fine3")];
  let fy = 70;
  for (const line of fine) {
    await t.draw(page, line, { x: LEFT, y: fy, size: 8.5, color: C.muted });
    fy -= 11;
  }

  if (data.revokedAt) {
    // a stamp across the text column; the page still shows what was revoked
    const stamp = m("stamp");
    const size = 88;
    const w = await t.width(stamp, "bold", size);
    const cx = LEFT + width / 2;
    const cy = PAGE.height / 2 + 20;
    const a = degrees(18);
    const rad = (18 * Math.PI) / 180;
    page.drawText(stamp, {
      x: cx - (w / 2) * Math.cos(rad) + (size / 3) * Math.sin(rad),
      y: cy - (w / 2) * Math.sin(rad) - (size / 3) * Math.cos(rad),
      size,
      font: (await t.runs(stamp, "bold"))[0]!.font,
      color: C.caution,
      opacity: 0.28,
      rotate: a,
    });
    const note = m("revokedNote", { date: formatCertificateDate(data.revokedAt) });
    page.drawRectangle({ x: LEFT, y: PAGE.height - 46, width, height: 26, color: C["caution-light"] });
    await t.draw(page, note, { x: LEFT + 10, y: PAGE.height - 37, size: 11, face: "bold", color: C.caution });
  }

  return doc.save({ useObjectStreams: true });
}
