// Certificate PDF generation: time per document (median and p95 of 200, after a short warm-up) and
// size, against the targets (median under 50 ms, under 150 kB with embedded fonts).
// Run: npx tsx --conditions=react-server bench/certificate-pdf.ts
// Writes bench/results/certificate-pdf.json. Needs no database: the PDF module takes plain data.
import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { renderCertificatePdf, type CertificatePdfData } from "../lib/certificates/pdf";

const RUNS = 200;
const WARMUP = 10;
const TARGET_MEDIAN_MS = 50;
const TARGET_BYTES = 150 * 1024;

const here = path.dirname(fileURLToPath(import.meta.url));
const fontDir = path.resolve(here, "..", "node_modules");

// Invented holder; serial and code vary per document as they do in use.
const data = (i: number): CertificatePdfData => ({
  serial: `RSR-2026-${String(i + 1).padStart(6, "0")}`,
  holderName: i % 2 ? "Zoë Ñúñez-Łukasz" : "Ξένια Жукова-Brannock", // every other one needs the DejaVu fallback
  organizationName: "Quillmoor Fire Protection",
  kind: i % 5 === 0 ? "path" : "module",
  subjectTitle: i % 5 === 0 ? "New installer" : "Hydraulics and the permit package",
  ceHours: i % 5 === 0 ? 8 : 2,
  issuedAt: new Date("2026-12-01T15:00:00Z"),
  expiresAt: new Date("2028-12-01T15:00:00Z"),
  verificationCode: Buffer.from(`bench-${i}-verification`).toString("base64url").slice(0, 24).padEnd(24, "A"),
  revokedAt: null,
  parts: i % 5 === 0 ? ["How a home sprinkler system works", "Pipe materials and joining", "Sprinklers and coverage", "Freeze protection", "Inspection, testing and maintenance", "Working with the other trades"] : undefined,
});
const url = (d: CertificatePdfData) => `https://riser.example/verify/${d.verificationCode}`;

function percentile(sorted: number[], p: number): number {
  const idx = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[idx]!;
}
const round = (n: number, d = 2) => Math.round(n * 10 ** d) / 10 ** d;

const t0 = performance.now();
await renderCertificatePdf(data(0), { verifyUrl: url(data(0)), fontDir });
const coldMs = performance.now() - t0;
for (let i = 0; i < WARMUP; i++) await renderCertificatePdf(data(i), { verifyUrl: url(data(i)), fontDir });

const times: number[] = [];
const sizes: number[] = [];
for (let i = 0; i < RUNS; i++) {
  const d = data(i);
  const start = performance.now();
  const bytes = await renderCertificatePdf(d, { verifyUrl: url(d), fontDir });
  times.push(performance.now() - start);
  sizes.push(bytes.byteLength);
}
const sorted = [...times].sort((a, b) => a - b);
const sortedSizes = [...sizes].sort((a, b) => a - b);
const result = {
  benchmark: "certificate-pdf",
  date: new Date().toISOString(),
  runs: RUNS,
  warmup: WARMUP,
  machine: { node: process.version, platform: `${os.platform()} ${os.arch()}`, cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? "unknown", loadAverage1m: round(os.loadavg()[0] ?? 0) },
  timeMs: { cold: round(coldMs), min: round(sorted[0]!), median: round(percentile(sorted, 50)), p95: round(percentile(sorted, 95)), max: round(sorted.at(-1)!) },
  sizeBytes: {
    min: sortedSizes[0]!,
    median: percentile(sortedSizes, 50),
    max: sortedSizes.at(-1)!,
    latinNameMedian: percentile(sizes.filter((_, i) => i % 2 === 1).sort((a, b) => a - b), 50),
    fallbackNameMedian: percentile(sizes.filter((_, i) => i % 2 === 0).sort((a, b) => a - b), 50),
  },
  targets: { medianMs: TARGET_MEDIAN_MS, maxBytes: TARGET_BYTES },
  meetsTargets: { median: percentile(sorted, 50) < TARGET_MEDIAN_MS, size: sortedSizes.at(-1)! < TARGET_BYTES },
  note: "Half the documents carry a Greek/Cyrillic name (DejaVu Sans embedded as fallback), one in five is a path certificate. Other processes share this machine; see loadAverage1m.",
};
const outDir = path.join(here, "results");
mkdirSync(outDir, { recursive: true });
writeFileSync(path.join(outDir, "certificate-pdf.json"), `${JSON.stringify(result, null, 2)}\n`);
console.log(JSON.stringify(result, null, 2));
