// Content lint: the curriculum is complete, every reference resolves, safety-critical lessons carry
// a caution, and validation rejects a broken tree naming the file and the field.
import path from "node:path";
import { describe, expect, it } from "vitest";
import { ContentError, loadCatalogFrom } from "@/lib/content/load";
import { mdxToText } from "@/lib/search/docs";

const catalog = loadCatalogFrom(path.resolve("content"));
const lessons = catalog.modules.flatMap((m) => m.lessons);
const CALCULATORS = ["sprinkler-flow", "friction-loss", "elevation", "flow-test", "stored-water", "room-coverage", "system-demand"];

function internalLinks(body: string): string[] {
  return [...body.matchAll(/\]\((\/[^)\s#]*)(?:#[^)]*)?\)/g), ...body.matchAll(/href="(\/[^"#]*)/g)].map((m) => m[1]!);
}

function resolves(href: string): boolean {
  const parts = href.split("/").filter(Boolean);
  if (parts[0] === "modules") {
    const m = catalog.modules.find((x) => x.slug === parts[1]);
    if (!m) return false;
    if (parts.length === 2) return true;
    return parts.length === 3 && (parts[2] === "quiz" || m.lessons.some((l) => l.slug === parts[2]));
  }
  if (parts[0] === "reference") return parts.length === 1 || catalog.cards.some((c) => c.slug === parts[1]);
  if (parts[0] === "tools") return parts.length === 1 || CALCULATORS.includes(parts[1]!);
  return ["glossary", "search", "learn", "certificates", "modules", "reference"].includes(parts[0]!) && parts.length === 1;
}

describe("curriculum (ten modules, 3–5 lessons each, four paths)", () => {
  it("has the ten modules, at least 48 lessons, 45 cards, 100 terms and the four paths", () => {
    expect(catalog.modules).toHaveLength(10);
    expect(lessons.length).toBeGreaterThanOrEqual(48);
    for (const m of catalog.modules) expect(m.lessons.length).toBeGreaterThanOrEqual(3);
    expect(catalog.cards.length).toBeGreaterThanOrEqual(45);
    expect(catalog.glossary.length).toBeGreaterThanOrEqual(100);
    expect(catalog.paths.map((p) => p.slug).sort()).toEqual(["builder-sales", "crew-lead", "design-and-permits", "new-installer"]);
  });

  it.each(lessons.map((l) => [`${l.module}/${l.slug}`, l] as const))("%s: 600–1,500 words, edition note, sources, worked example", (_, l) => {
    const words = mdxToText(l.body).split(/\s+/).filter(Boolean).length;
    expect(words).toBeGreaterThanOrEqual(600);
    expect(words).toBeLessThanOrEqual(1500);
    expect(l.meta.edition.length).toBeGreaterThan(20);
    expect(l.meta.sources.length).toBeGreaterThan(0);
    expect(l.body).toMatch(/<WorkedExample/);
  });

  it("puts a caution in every lesson on freeze protection, testing, hydraulics and antifreeze", () => {
    const critical = lessons.filter(
      (l) => ["freeze-protection", "inspection-testing-maintenance", "hydraulics-and-permits"].includes(l.module) || /antifreeze/i.test(l.slug + l.meta.title),
    );
    expect(critical.length).toBeGreaterThanOrEqual(13);
    const missing = critical.filter((l) => !/<Callout\s+type="caution"/.test(l.body)).map((l) => `${l.module}/${l.slug}`);
    expect(missing).toEqual([]);
  });

  it("has at least one inline SVG diagram per module", () => {
    const without = catalog.modules.filter((m) => !m.lessons.some((l) => /<Figure[\s\S]*?<svg/.test(l.body))).map((m) => m.slug);
    expect(without).toEqual([]);
  });

  it("resolves every internal link and glossary reference in lessons and cards", () => {
    const terms = new Set(catalog.glossary.map((t) => t.id));
    const broken: string[] = [];
    for (const doc of [...lessons.map((l) => ({ name: `${l.module}/${l.slug}`, body: l.body })), ...catalog.cards.map((c) => ({ name: `card ${c.slug}`, body: c.body }))]) {
      for (const href of internalLinks(doc.body)) if (!resolves(href)) broken.push(`${doc.name}: link ${href}`);
      for (const [, id] of doc.body.matchAll(/<Term\s+id="([^"]+)"/g)) if (!terms.has(id!)) broken.push(`${doc.name}: term ${id}`);
      for (const [, id] of doc.body.matchAll(/<Calculator\s+id="([^"]+)"/g)) if (!CALCULATORS.includes(id!)) broken.push(`${doc.name}: calculator ${id}`);
    }
    for (const t of catalog.glossary) for (const s of t.see) if (!terms.has(s)) broken.push(`glossary ${t.id}: see ${s}`);
    expect(broken).toEqual([]);
  });

  it("gives every card the sections of a code-reference card", () => {
    for (const c of catalog.cards) {
      expect(c.body, c.slug).toMatch(/## Intent/);
      expect(c.body, c.slug).toMatch(/## What to check in the field/);
      expect(c.body, c.slug).toMatch(/## Common mistakes/);
    }
  });

});

describe("validation", () => {
  it("rejects a broken content tree naming the file and the field", () => {
    let error: unknown;
    try {
      loadCatalogFrom(path.resolve("tests/fixtures/content-broken"));
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ContentError);
    const message = (error as ContentError).message;
    expect(message).toContain('content-broken/modules/bad-module/module.yaml: field "passMark"');
    expect(message).toContain('field "ceHours"');
    expect(message).toContain("paths.yaml: missing");
    expect(message).toMatch(/glossary\.yaml: field "terms"/);
  });
});
