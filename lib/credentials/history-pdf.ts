import "server-only";
/**
 * The training history as a PDF (US Letter, portrait), drawn with lib/pdf (the app's fonts with their
 * fallback, the theme palette): hours per reporting period, every certificate with its status,
 * verification code and a QR code of its verification address, and every module completion.
 * No database or environment here: callers pass the history.
 */
import type { PDFPage } from "pdf-lib";
import QRCode from "qrcode";
import { formatCertificateDate, formatHours, KIND_LABEL, STATUS_LABEL } from "@/lib/certificates/browser";
import { C, createPdf, defaultFontDir } from "@/lib/pdf";
import { palette } from "@/lib/theme";
import { COUNTING_LABEL } from "./period";
import type { TrainingHistory } from "./history";

const W = 612;
const H = 792;
const M = 48;
const TOP = H - 56;
const BOTTOM = 64;
const QR = 66;

export async function renderHistoryPdf(h: TrainingHistory, o: { fontDir?: string } = {}): Promise<Uint8Array> {
  const { doc, t } = await createPdf(o.fontDir ?? defaultFontDir());
  doc.setTitle(`Riser training history: ${h.person.name}`, { showInWindowTitleBar: true });
  doc.setAuthor("Riser");
  doc.setSubject(`Certificates, completions and continuing-education hours of ${h.person.name}`);
  doc.setCreator("Riser");
  doc.setProducer("Riser (pdf-lib)");
  doc.setLanguage("en-US");
  doc.setCreationDate(h.generatedAt);
  doc.setModificationDate(h.generatedAt);

  let page: PDFPage = doc.addPage([W, H]);
  let y = TOP;
  const newPage = () => {
    page = doc.addPage([W, H]);
    y = TOP;
  };
  const room = (needed: number) => {
    if (y - needed < BOTTOM) newPage();
  };
  const heading = async (text: string) => {
    room(60);
    y -= 10;
    await t.draw(page, text, { x: M, y, size: 14, face: "bold", color: C.ink });
    y -= 8;
    page.drawLine({ start: { x: M, y }, end: { x: W - M, y }, thickness: 1, color: C.line });
    y -= 18;
  };

  // ----- title -----
  await t.draw(page, "RISER · TRAINING HISTORY", { x: M, y, size: 9, face: "bold", color: C.copper, spacing: 1.2 });
  y -= 30;
  const nameSize = await t.fit(h.person.name, "bold", 24, W - 2 * M, 12);
  await t.draw(page, h.person.name, { x: M, y, size: nameSize, face: "bold" });
  y -= 18;
  if (h.person.organizationName) {
    await t.draw(page, h.person.organizationName, { x: M, y, size: 11, color: C.muted });
    y -= 15;
  }
  await t.draw(page, `Generated ${formatCertificateDate(h.generatedAt)}. CE hours are totalled by ${h.settingText}.`, { x: M, y, size: 9.5, color: C.muted });
  y -= 22;

  // ----- hours per period -----
  await heading("Continuing-education hours by reporting period");
  if (h.totals.length === 0) {
    await t.draw(page, "No hours counted yet.", { x: M, y, size: 10.5 });
    y -= 16;
  }
  for (const p of h.totals) {
    room(18);
    await t.draw(page, p.label, { x: M, y, size: 11, face: "bold" });
    await t.draw(page, `${formatHours(p.hours)} h`, { x: M + 300, y, size: 11, face: "monoBold", align: "right" });
    await t.draw(page, `from ${p.certificates} module certificate${p.certificates === 1 ? "" : "s"}`, { x: M + 316, y, size: 10, color: C.muted });
    y -= 17;
  }
  y -= 4;
  for (const line of await t.wrap(
    "Counted: module certificates, by the date issued. Not counted: learning-path certificates (their modules count), revoked certificates, and a module passed again within the same period.",
    "regular",
    8.5,
    W - 2 * M,
  )) {
    room(11);
    await t.draw(page, line, { x: M, y, size: 8.5, color: C.muted });
    y -= 11;
  }

  // ----- certificates -----
  await heading("Certificates");
  if (h.certificates.length === 0) {
    await t.draw(page, "No certificates yet.", { x: M, y, size: 10.5 });
    y -= 16;
  }
  const textW = W - 2 * M - QR - 16;
  for (const c of h.certificates) {
    room(QR + 18);
    const top = y;
    const png = await QRCode.toBuffer(c.verifyUrl, {
      type: "png",
      errorCorrectionLevel: "M",
      margin: 2,
      scale: 4,
      color: { dark: `${palette.ink}FF`, light: `${palette.panel}FF` },
      rendererOpts: { deflateLevel: 6, filterType: 0, colorType: 2 } as { deflateLevel: number },
    });
    page.drawImage(await doc.embedPng(png), { x: W - M - QR, y: top - QR + 10, width: QR, height: QR });
    const titleSize = await t.fit(c.subjectTitle, "bold", 11.5, textW, 8);
    await t.draw(page, c.subjectTitle, { x: M, y, size: titleSize, face: "bold" });
    const statusColor = c.status === "valid" ? C.pass : c.status === "revoked" ? C.caution : C.muted;
    y -= 14;
    const x = await t.draw(page, `${STATUS_LABEL[c.status]}`, { x: M, y, size: 9.5, face: "bold", color: statusColor });
    await t.draw(page, `  ·  ${KIND_LABEL[c.kind]}  ·  ${c.serial}  ·  ${formatHours(c.ceHours)} CE hours`, { x, y, size: 9.5 });
    y -= 13;
    const until = c.status === "expired" ? "expired" : "valid until";
    await t.draw(page, `Issued ${formatCertificateDate(c.issuedAt)}, ${until} ${formatCertificateDate(c.expiresAt)}${c.revokedAt ? `, revoked ${formatCertificateDate(c.revokedAt)}` : ""}`, { x: M, y, size: 9.5 });
    y -= 13;
    await t.draw(page, `Period ${c.period}: ${COUNTING_LABEL[c.counting]}`, { x: M, y, size: 9, color: C.muted });
    y -= 12;
    await t.draw(page, `Code ${c.codeShown}`, { x: M, y, size: 8.5, face: "mono", color: C.ink });
    y -= 11;
    const urlSize = await t.fit(c.verifyUrl, "mono", 8.5, textW, 5.5);
    await t.draw(page, c.verifyUrl, { x: M, y, size: urlSize, face: "mono", color: C.water });
    // blank space between entries: nothing printed across it but a thin rule
    y = Math.min(y, top - QR + 10) - 12;
    page.drawLine({ start: { x: M, y }, end: { x: W - M, y }, thickness: 0.5, color: C.line });
    y -= 20;
  }

  // ----- completions -----
  await heading("Module completions");
  if (h.completions.length === 0) {
    await t.draw(page, "No module completed yet.", { x: M, y, size: 10.5 });
    y -= 16;
  }
  for (const m of h.completions) {
    room(15);
    await t.draw(page, formatCertificateDate(m.completedAt), { x: M, y, size: 9.5 });
    const titleSize = await t.fit(m.title, "regular", 9.5, 270, 6);
    await t.draw(page, m.title, { x: M + 130, y, size: titleSize });
    await t.draw(page, m.serial ?? "", { x: W - M, y, size: 9, face: "mono", align: "right", color: C.muted });
    y -= 15;
    if (m.seatMinutes !== null) {
      room(13);
      await t.draw(page, `Seat time ${m.seatMinutes} min read (measured by Riser's server)`, { x: M + 130, y: y + 3, size: 8.5, color: C.muted });
      y -= 12;
    }
  }

  // ----- footer on every page -----
  const pages = doc.getPages();
  for (const [i, p] of pages.entries()) {
    await t.draw(p, "Hours are Riser's estimate of study time; whether they count toward a licence is for the licensing body or authority having jurisdiction.", {
      x: M,
      y: 36,
      size: 7.5,
      color: C.muted,
    });
    await t.draw(p, `${h.person.name} · page ${i + 1} of ${pages.length}`, { x: W - M, y: 24, size: 7.5, color: C.muted, align: "right" });
  }
  return doc.save({ useObjectStreams: true });
}
