// What "Keep on this phone" stores for a module and the version that makes a phone replace a stale
// copy (lib/offline/plan.ts), checked against the real content in content/.
import path from "node:path";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { loadCatalogFrom, localizeCatalog, type Catalog } from "@/lib/content";
import { CALCULATOR_IDS } from "@/lib/hydraulics";
import { linkedCards, offlinePlan } from "@/lib/offline/plan";
import { APP_ICONS, appIconSvg, palette } from "@/lib/theme";

const catalog = loadCatalogFrom(path.resolve("content"));
const MODULE = "freeze-protection";
const plan = (c: Catalog, build = "build-1") => offlinePlan(c, MODULE, build, CALCULATOR_IDS)!;
const clone = (): Catalog => structuredClone(catalog);

describe("offline plan", () => {
  it("holds the module page, every lesson in teaching order, the linked cards, the glossary and every calculator — never the quiz", () => {
    const mod = catalog.modules.find((m) => m.slug === MODULE)!;
    const p = plan(catalog);
    expect(p.urls.slice(0, 1 + mod.lessons.length)).toEqual([`/modules/${MODULE}`, ...mod.lessons.map((l) => `/modules/${MODULE}/${l.slug}`)]);
    for (const card of linkedCards(catalog, MODULE)) expect(p.urls).toContain(`/reference/${card}`);
    expect(p.urls).toContain("/glossary");
    expect(p.urls).toContain("/offline"); // the "needs a connection" page, in the reader's language
    for (const id of CALCULATOR_IDS) expect(p.urls).toContain(`/tools/${id}`);
    expect(p.urls.filter((u) => u.includes("quiz") || u.includes("sign-offs"))).toEqual([]);
    expect(new Set(p.urls).size).toBe(p.urls.length);
  });

  it("finds the cards a lesson links to in its MDX, and only cards that exist", () => {
    const c = clone();
    const lesson = c.modules.find((m) => m.slug === MODULE)!.lessons[0]!;
    const card = c.cards.find((x) => !linkedCards(catalog, MODULE).includes(x.slug))!;
    lesson.body += `\nSee [the card](/reference/${card.slug}) and [nothing](/reference/no-such-card).`;
    expect(linkedCards(c, MODULE)).toContain(card.slug);
    expect(linkedCards(c, MODULE)).not.toContain("no-such-card");
  });

  it("changes its version when a lesson, a linked card, the glossary or the app build changes, and not otherwise", () => {
    const base = plan(catalog).version;
    expect(plan(clone()).version).toBe(base);
    const lessonChanged = clone();
    lessonChanged.modules.find((m) => m.slug === MODULE)!.lessons[1]!.body += "\nOne more sentence.";
    expect(plan(lessonChanged).version).not.toBe(base);
    const cardChanged = clone();
    const slug = linkedCards(catalog, MODULE)[0]!;
    cardChanged.cards.find((x) => x.slug === slug)!.body += "\nEdited.";
    expect(plan(cardChanged).version).not.toBe(base);
    const glossaryChanged = clone();
    glossaryChanged.glossary[0]!.definition += " (revised)";
    expect(plan(glossaryChanged).version).not.toBe(base);
    expect(plan(catalog, "build-2").version).not.toBe(base);
    // Another module's lesson is not part of this copy.
    const otherChanged = clone();
    otherChanged.modules.find((m) => m.slug !== MODULE)!.lessons[0]!.body += "\nElsewhere.";
    expect(plan(otherChanged).version).toBe(base);
  });

  it("is kept in the reader's language: a Spanish copy carries the Spanish title, has its own version and goes stale when a Spanish twin changes", () => {
    const es = (c: Catalog) => offlinePlan(localizeCatalog(c, "es"), MODULE, "build-1", CALCULATOR_IDS, "es")!;
    const en = plan(catalog);
    const spanish = es(catalog);
    // the Spanish module title as written in content/es (its module.yaml), not the English one
    expect(spanish.title).toBe(catalog.es.modules[MODULE]!.title);
    expect(spanish.title).not.toBe(en.title);
    expect(spanish.locale).toBe("es");
    // same pages to store (the addresses carry no language), a different version: a reader who
    // switches language finds every kept copy stale and gets it again in the new language
    expect(spanish.urls).toEqual(en.urls);
    expect(spanish.version).not.toBe(en.version);
    const twinChanged = clone();
    const key = `${MODULE}/${twinChanged.modules.find((m) => m.slug === MODULE)!.lessons[0]!.slug}`;
    twinChanged.es.lessons[key]!.body += "\nUna oración más.";
    expect(es(twinChanged).version).not.toBe(spanish.version);
    // an edit to the Spanish text alone leaves the English copy as it was
    expect(plan(twinChanged).version).toBe(en.version);
  });

  it("has no plan for a module that does not exist", () => {
    expect(offlinePlan(catalog, "no-such-module", "b", CALCULATOR_IDS)).toBeNull();
  });
});

describe("home-screen icons", () => {
  it("are drawn in Riser's palette and fill the size they claim", async () => {
    for (const icon of APP_ICONS) {
      const svg = appIconSvg(icon);
      for (const token of ["ink", "paper", "copper-bright", "water-light"] as const) expect(svg).toContain(palette[token]);
      const { data, info } = await sharp(path.resolve("public/icons", icon.file)).raw().toBuffer({ resolveWithObject: true });
      expect([info.width, info.height]).toEqual([icon.size, icon.size]);
      // the committed PNG is the current drawing: the middle of its top edge is the ink ground
      const at = (info.width + Math.floor(info.width / 2)) * info.channels;
      const hex = `#${[...data.subarray(at, at + 3)].map((b) => b.toString(16).padStart(2, "0")).join("")}`.toUpperCase();
      expect(hex).toBe(palette.ink.toUpperCase());
    }
  });
});
