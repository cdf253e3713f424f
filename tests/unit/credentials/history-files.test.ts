// The training history files read back by outside tools: the PDF's text with poppler's pdftotext,
// every page rendered with pdftoppm and each QR code decoded with jsqr (as the certificate PDF test
// does, tests/helpers/pdf.ts), and the CSV parsed with Papa Parse.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import path from "node:path";
import jsQR from "jsqr";
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import { historyCsv, HISTORY_CSV_COLUMNS } from "@/lib/credentials/history-csv";
import { renderHistoryPdf } from "@/lib/credentials/history-pdf";
import type { TrainingHistory } from "@/lib/credentials/history";
import { CALENDAR_YEARS, describeSetting, hoursByPeriod, periodOf } from "@/lib/credentials/period";
import { pdfText } from "../../helpers/pdf";

type PngSync = { sync: { read(buf: Buffer): { width: number; height: number; data: Buffer } } };
const { PNG } = createRequire(import.meta.url)("pngjs") as { PNG: PngSync };

/**
 * Every QR code on every page. jsqr reads one code per image, so each page is cut into bands of
 * rows with ink, separated by blank rows; each band at least as tall as a code (minus its quiet
 * zone) is read on its own.
 */
function allQrCodes(bytes: Uint8Array, dpi = 150): string[] {
  const dir = mkdtempSync(path.join(tmpdir(), "riser-history-"));
  try {
    writeFileSync(path.join(dir, "doc.pdf"), bytes);
    execFileSync("pdftoppm", ["-png", "-r", String(dpi), path.join(dir, "doc.pdf"), path.join(dir, "page")]);
    const found: string[] = [];
    for (const file of readdirSync(dir).filter((f) => f.endsWith(".png")).sort()) {
      const png = PNG.sync.read(readFileSync(path.join(dir, file)));
      const row = png.width * 4;
      const inked = (y: number) => {
        for (let x = 0; x < png.width; x++) if (png.data[y * row + x * 4]! < 128) return true;
        return false;
      };
      const bands: [number, number][] = [];
      for (let y = 0, start = -1; y <= png.height; y++) {
        const ink = y < png.height && inked(y);
        if (ink && start < 0) start = y;
        if (!ink && start >= 0) {
          bands.push([start, y]);
          start = -1;
        }
      }
      for (const [a, b] of bands.filter(([a, b]) => b - a >= dpi / 2)) {
        const top = Math.max(0, a - 8);
        const h = Math.min(png.height, b + 8) - top;
        const code = jsQR(new Uint8ClampedArray(png.data.buffer, png.data.byteOffset + top * row, h * row), png.width, h);
        if (code) found.push(code.data);
      }
    }
    return found;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

const codes = ["7KQ2M9XD3HTVA8RWEC6N4JPB5GFZ", "Q8ZR4N6J2M7TXCV3KD9PHE5WAB1G", "q3Z_9xTq-Lm0Rw8sVb2NcY7e", "3MDX8QVK2NA4RTP7HJWZ9C6EB5GF", "=HYPERLINK(1)AAAAAAAAAAAAAA"];
function sampleHistory(count = codes.length): TrainingHistory {
  const base = [
    { subjectSlug: "freeze-protection", subjectTitle: "Freeze protection", ceHours: 1.5, issuedAt: new Date("2025-03-02T10:00:00Z"), status: "expired" as const, kind: "module" as const },
    { subjectSlug: "pipe-and-joining", subjectTitle: "Pipe and joining", ceHours: 2, issuedAt: new Date("2026-01-15T10:00:00Z"), status: "valid" as const, kind: "module" as const },
    { subjectSlug: "installer-basics", subjectTitle: "Installer basics", ceHours: 3.5, issuedAt: new Date("2026-01-15T10:00:00Z"), status: "valid" as const, kind: "path" as const },
    { subjectSlug: "hydraulics", subjectTitle: "Hydraulics and the permit package", ceHours: 2.25, issuedAt: new Date("2026-06-01T10:00:00Z"), status: "revoked" as const, kind: "module" as const },
    { subjectSlug: "testing", subjectTitle: "Testing and acceptance", ceHours: 1, issuedAt: new Date("2026-09-09T10:00:00Z"), status: "valid" as const, kind: "module" as const },
  ].slice(0, count);
  const certs = base.map((c, i) => ({
    ...c,
    id: i + 1,
    serial: `RSR-${c.issuedAt.getUTCFullYear()}-${String(i + 1).padStart(6, "0")}`,
    expiresAt: new Date(c.issuedAt.getTime() + 730 * 86_400_000),
    expiringSoon: false,
    verificationCode: codes[i]!,
    revokedAt: c.status === "revoked" ? new Date("2026-07-01T00:00:00Z") : null,
    renewsSerial: null,
    renewedBySerial: null,
  }));
  const { counting, totals } = hoursByPeriod(certs, CALENDAR_YEARS);
  return {
    person: { id: "p1", name: "Zoë Ñúñez-Łukasz", organizationName: "Quillmoor Fire Protection" },
    setting: CALENDAR_YEARS,
    settingText: describeSetting(CALENDAR_YEARS),
    totals,
    certificates: certs.map((c) => ({
      ...c,
      counting: counting.get(c)!,
      period: periodOf(c.issuedAt, CALENDAR_YEARS).label,
      verifyUrl: `https://riser.example/verify/${c.verificationCode}`,
      codeShown: c.verificationCode.length === 28 ? c.verificationCode.match(/.{4}/g)!.join("-") : c.verificationCode,
    })),
    // seat time (server-measured minutes) for two modules; the others have none recorded
    completions: certs
      .filter((c) => c.kind === "module")
      .map((c) => ({ moduleSlug: c.subjectSlug, title: c.subjectTitle, completedAt: c.issuedAt, serial: c.serial, seatMinutes: ({ "freeze-protection": 47, testing: 0 } as Record<string, number>)[c.subjectSlug] ?? null })),
    generatedAt: new Date("2026-12-02T08:00:00Z"),
  };
}

describe("training history PDF", () => {
  const h = sampleHistory();
  let bytes: Uint8Array;
  beforeAll(async () => {
    bytes = await renderHistoryPdf(h); // rendered once for the checks below (fonts load on first use)
  }, 30_000);

  it("prints the totals per period, every certificate with status and code, and every completion", () => {
    const text = pdfText(bytes).replace(/\s+/g, " ");
    // 2025: freeze 1.5; 2026: pipe 2 + testing 1 = 3 (the path and the revoked module do not count)
    expect(text).toContain("2026 3 h from 2 module certificates");
    expect(text).toContain("2025 1.5 h from 1 module certificate");
    expect(text).toContain("Zoë Ñúñez-Łukasz");
    for (const c of h.certificates) {
      expect(text).toContain(c.serial);
      expect(text).toContain(c.codeShown);
      expect(text).toContain(c.subjectTitle);
    }
    expect(text).toContain("Revoked");
    expect(text).toContain("Expired");
    expect(text).toContain("not counted: learning path");
    expect(text).toContain("Module completions");
    // seat time only where the server measured some: a line per such module, none for the others
    expect(text).toContain("Seat time 47 min read (measured by Riser's server)");
    expect(text).toContain("Seat time 0 min read");
    expect(text.match(/Seat time \d+ min read/g)).toHaveLength(2);
  });

  it("has one QR code per certificate, each decoding to that certificate's verification address", async () => {
    const h = sampleHistory();

    expect(allQrCodes(await renderHistoryPdf(h)).sort()).toEqual(h.certificates.map((c) => c.verifyUrl).sort());
  });

  it("runs onto further pages for a long history, numbering them", async () => {
    const many = { ...h, certificates: Array.from({ length: 14 }, (_, i) => ({ ...h.certificates[i % 5]!, serial: `RSR-2026-${String(100 + i).padStart(6, "0")}` })) };
    const text = pdfText(await renderHistoryPdf(many));
    expect(text).toMatch(/page 1 of [2-9]/);
    for (const c of many.certificates) expect(text).toContain(c.serial);
  }, 20_000);
});

describe("training history CSV", () => {
  it("has a row per period total, certificate and completion, with codes and URLs, formula-like cells neutralised", () => {
    const h = sampleHistory();
    const rows = Papa.parse<string[]>(historyCsv(h), { skipEmptyLines: true }).data;
    expect(rows[0]).toEqual(HISTORY_CSV_COLUMNS);
    const col = (name: string) => HISTORY_CSV_COLUMNS.indexOf(name);
    const totals = rows.filter((r) => r[0] === "Period total");
    expect(totals.map((r) => [r[col("Reporting period")], r[col("CE hours")]])).toEqual([
      ["2026", "3.00"],
      ["2025", "1.50"],
    ]);
    const certs = rows.filter((r) => r[0] === "Certificate");
    expect(certs).toHaveLength(5);
    expect(certs.map((r) => r[col("Status")])).toEqual(["expired", "valid", "valid", "revoked", "valid"]);
    expect(certs[0]![col("Verification code")]).toBe("7KQ2-M9XD-3HTV-A8RW-EC6N-4JPB-5GFZ");
    // OWASP CSV injection guard (lib/csv): a cell starting with "=" gets a leading quote
    expect(certs[4]![col("Verification code")]).toBe("'=HYPERLINK(1)AAAAAAAAAAAAAA");
    const done = rows.filter((r) => r[0] === "Completion");
    expect(done).toHaveLength(4);
    expect(Object.fromEntries(done.map((r) => [r[col("Title")], r[col("Seat time (minutes)")]]))).toEqual({
      "Freeze protection": "47",
      "Pipe and joining": "",
      "Hydraulics and the permit package": "",
      "Testing and acceptance": "0",
    });
    for (const r of rows) expect(r).toHaveLength(HISTORY_CSV_COLUMNS.length);
  });
});
