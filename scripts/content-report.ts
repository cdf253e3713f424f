// `npm run content:report`: per lesson, card, quiz bank and the glossary, the figures found, how each
// is sourced, and the "from memory" markers left; then the totals. `--unsourced` lists every figure
// the lint would reject; `--memory` lists every marker with its line. Read-only: writes nothing.
import { readFileSync } from "node:fs";
import path from "node:path";
import { loadCatalogFrom } from "@/lib/content";
import { countMarkers, figuresIn, type Sourcing } from "./lib/content-figures";

const root = path.resolve(process.cwd(), "content");
const catalog = loadCatalogFrom(root);
const SOURCINGS: Sourcing[] = ["provision", "named document", "common practice", "worked example", "from memory", "unsourced"];
const showUnsourced = process.argv.includes("--unsourced");
const showMemory = process.argv.includes("--memory");

type Row = { file: string; counts: Record<Sourcing, number>; markers: number };
const rows: Row[] = [];
const zero = () => Object.fromEntries(SOURCINGS.map((s) => [s, 0])) as Record<Sourcing, number>;

function addDoc(file: string, body: string, sources: string[], extraText = "") {
  const counts = zero();
  for (const f of figuresIn(body, sources)) {
    counts[f.sourcing]++;
    if (showUnsourced && f.sourcing === "unsourced") console.log(`  unsourced ${file}: "${f.text}" in: ${f.context}`);
  }
  const raw = readFileSync(path.join(root, "..", file), "utf8");
  const markers = countMarkers(raw) + countMarkers(extraText);
  if (showMemory) raw.split("\n").forEach((line, i) => /from memory/i.test(line) && console.log(`  marker ${file}:${i + 1}: ${line.trim().slice(0, 140)}`));
  rows.push({ file, counts, markers });
}

for (const m of catalog.modules) {
  for (const l of m.lessons) addDoc(`content/modules/${m.slug}/${l.slug}.mdx`, l.body, l.meta.sources);
  const bank = `content/modules/${m.slug}/quiz.yaml`;
  const text = readFileSync(path.join(root, "modules", m.slug, "quiz.yaml"), "utf8");
  if (showMemory) text.split("\n").forEach((line, i) => /from memory/i.test(line) && console.log(`  marker ${bank}:${i + 1}: ${line.trim().slice(0, 140)}`));
  rows.push({ file: bank, counts: zero(), markers: countMarkers(text) });
}
for (const c of catalog.cards) addDoc(`content/reference/${c.slug}.mdx`, c.body, c.meta.sources);
const glossaryText = readFileSync(path.join(root, "glossary.yaml"), "utf8");
rows.push({ file: "content/glossary.yaml", counts: zero(), markers: countMarkers(glossaryText) });

const pad = (s: string | number, n: number) => String(s).padStart(n);
const header = ["provision", "named doc", "practice", "example", "memory", "UNSOURCED", "markers"];
console.log(`${"file".padEnd(78)} ${header.map((h) => pad(h, 9)).join(" ")}`);
const total = zero();
let markers = 0;
for (const r of rows) {
  for (const s of SOURCINGS) total[s] += r.counts[s];
  markers += r.markers;
  console.log(`${r.file.padEnd(78)} ${SOURCINGS.map((s) => pad(r.counts[s], 9)).join(" ")} ${pad(r.markers, 9)}`);
}
console.log(`${"TOTAL".padEnd(78)} ${SOURCINGS.map((s) => pad(total[s], 9)).join(" ")} ${pad(markers, 9)}`);
const figures = SOURCINGS.reduce((n, s) => n + total[s], 0);
console.log(`\n${figures} figures with units in lessons and cards; ${total.unsourced} unsourced; ${markers} "from memory" markers left (target: at most 80).`);
