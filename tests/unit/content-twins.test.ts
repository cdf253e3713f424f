// Spanish twins (content/es/) against their English files. Reference: the English file itself and the
// layout rules every translator follows (same ids and order, the same numbers with the same units, the
// same callouts, figures, calculator embeds, glossary references, edition passages and headings, and
// only the translated fields). The first block runs over the real tree; the others break one thing in
// a small text or a throwaway tree and check that the comparison or the loader names it.
import { existsSync, readdirSync, readFileSync, rmSync, statSync, unlinkSync, writeFileSync } from "node:fs";
import path from "node:path";
import matter from "gray-matter";
import YAML from "yaml";
import { compile } from "@mdx-js/mdx";
import remarkFrontmatter from "remark-frontmatter";
import remarkGfm from "remark-gfm";
import remarkMdxFrontmatter from "remark-mdx-frontmatter";
import { afterAll, describe, expect, it } from "vitest";
import { ContentError, enHash, loadCatalogFrom, readStamp, twinPairs, twinProblems, writeStamp } from "@/lib/content";
import { compareBodies, compareMdx, compareYaml, numbersOf } from "@/lib/content/twins";
import { makeTwinTree } from "../helpers/es-tree";

const root = path.resolve("content");
const problemsOf = (dir: string): string[] => {
  try {
    const catalog = loadCatalogFrom(dir);
    return twinProblems(dir, catalog);
  } catch (err) {
    if (err instanceof ContentError) return err.problems;
    throw err;
  }
};

describe("the real content tree: every English file has a Spanish twin that matches it", () => {
  const walk = (d: string): string[] => (existsSync(d) ? readdirSync(d).flatMap((f) => (statSync(path.join(d, f)).isDirectory() ? walk(path.join(d, f)) : [path.join(d, f)])) : []);
  const english = walk(root).filter((f) => !f.startsWith(path.join(root, "es")) && !f.includes(".generated")).map((f) => path.relative(root, f));
  const spanish = walk(path.join(root, "es")).map((f) => path.relative(path.join(root, "es"), f));

  it("has no missing and no extra Spanish file", () => {
    expect(spanish.filter((f) => !english.includes(f)), "Spanish files without an English twin").toEqual([]);
    expect(english.filter((f) => !spanish.includes(f)), "English files without a Spanish twin").toEqual([]);
  });

  it("loads with the Spanish checked (ids, order, option ids, only translated fields) and every twin matches its English", () => {
    expect(problemsOf(root)).toEqual([]);
  });

  it("keeps each lesson's and card's callouts, figures, calculators, glossary references, edition tags and headings", () => {
    const found: string[] = [];
    for (const f of english.filter((x) => x.endsWith(".mdx") && spanish.includes(x))) {
      const e = matter(readFileSync(path.join(root, f), "utf8"));
      const s = matter(readFileSync(path.join(root, "es", f), "utf8"));
      for (const p of compareMdx({ data: e.data, content: e.content }, { data: s.data, content: s.content })) found.push(`es/${f}: ${p}`);
    }
    expect(found).toEqual([]);
  });

  it("compiles every Spanish lesson and card with the app's MDX plugins (next.config.mjs), as the build will", async () => {
    const failed: string[] = [];
    for (const f of spanish.filter((x) => x.endsWith(".mdx"))) {
      try {
        await compile(readFileSync(path.join(root, "es", f), "utf8"), { remarkPlugins: [remarkFrontmatter, [remarkMdxFrontmatter, { name: "frontmatter" }], remarkGfm] });
      } catch (err) {
        failed.push(`es/${f}: ${(err as Error).message.split("\n")[0]}`);
      }
    }
    expect(failed).toEqual([]);
  }, 60_000);

  it("keeps the numbers and units of every question, skill, glossary definition, path and module summary", () => {
    const found: string[] = [];
    for (const f of english.filter((x) => x.endsWith(".yaml") && spanish.includes(x))) {
      for (const p of compareYaml(YAML.parse(readFileSync(path.join(root, f), "utf8")), YAML.parse(readFileSync(path.join(root, "es", f), "utf8")))) found.push(`es/${f}: ${p}`);
    }
    expect(found).toEqual([]);
  });
});

describe("the comparison catches a changed twin (small texts written here)", () => {
  const en = `## Spacing\n\n<Callout type="caution" title="Check the listing">A pendent covers up to 144 ft² at 12 ft spacing; keep it 4 in below the ceiling.</Callout>\n\n<Figure caption="Spacing"><svg viewBox="0 0 10 10"><text x="1" y="2">12 ft</text></svg></Figure>\n\n<Calculator id="room-coverage" preset={{ lengthFt: 12 }} />\n\nSee <Term id="k-factor">K-factor</Term> and <Term id="pendent-sprinkler">pendents</Term>.\n`;
  const es = `## Separación\n\n<Callout type="caution" title="Revisa el listado">Un rociador colgante cubre hasta 144 ft² a 12 ft de separación; déjalo 4 in bajo el plafón.</Callout>\n\n<Figure caption="Separación"><svg viewBox="0 0 10 10"><text x="1" y="2">12 ft</text></svg></Figure>\n\n<Calculator id="room-coverage" preset={{ lengthFt: 12 }} />\n\nMira <Term id="k-factor">factor K</Term> y <Term id="pendent-sprinkler">colgantes</Term>.\n`;

  it("accepts a faithful translation", () => {
    expect(compareBodies(en, es)).toEqual([]);
  });
  it("catches a dropped number", () => {
    expect(compareBodies(en, es.replace("déjalo 4 in bajo", "déjalo bajo")).join("\n")).toMatch(/in English, not in Spanish: 4/);
  });
  it("catches a changed unit", () => {
    expect(compareBodies(en, es.replace("a 12 ft de separación", "a 12 m de separación")).join("\n")).toMatch(/numbers with units: in English, not in Spanish: 12 ft[\s\S]*in Spanish, not in English: 12 m/);
  });
  it("catches a missing callout and a changed callout type", () => {
    const noCallout = es.replace(/<Callout[^>]*>/, "").replace("</Callout>", "");
    expect(compareBodies(en, noCallout).join("\n")).toMatch(/callout types: English caution vs Spanish \(none\)/);
    expect(compareBodies(en, es.replace('type="caution"', 'type="note"')).join("\n")).toMatch(/callout types: English caution vs Spanish note/);
  });
  it("catches a dropped figure, a changed calculator preset, a missing glossary reference and a heading level", () => {
    expect(compareBodies(en, es.replace(/<Figure[^>]*>/, "")).join("\n")).toMatch(/figures: English 1 vs Spanish 0/);
    expect(compareBodies(en, es.replace("lengthFt: 12 }", "lengthFt: 10 }")).join("\n")).toMatch(/calculator embeds/);
    expect(compareBodies(en, es.replace(/<Term id="k-factor">factor K<\/Term>/, "factor K")).join("\n")).toMatch(/glossary references \(Term ids\): in English, not in Spanish: k-factor/);
    expect(compareBodies(en, es.replace("## Separación", "### Separación")).join("\n")).toMatch(/headings: English levels 2 vs Spanish 3/);
  });
  it("reads numbers as the layout rules write them: US separators, fractions, units kept; 'in' as a word is no unit", () => {
    expect(numbersOf("2,500 gal and 1/2 in and 7.5 psi at 70.6 in SI units")).toEqual(["2,500 gal", "1/2 in", "7.5 psi", "70.6"]);
    expect(numbersOf("NFPA 13 C-factor table")).toEqual(["13"]);
  });
  it("compares question lists by id and option ids, and their numbers", () => {
    const enQ = { questions: [{ id: "q1", type: "numeric", prompt: "How many psi at 13 gpm?", explanation: "K 4.9 gives 7 psi.", answer: 7, unit: "psi" }] };
    expect(compareYaml(enQ, { questions: [{ id: "q1", prompt: "¿Cuántos psi a 13 gpm?", explanation: "K 4.9 da 7 psi." }] })).toEqual([]);
    expect(compareYaml(enQ, { questions: [{ id: "q1", prompt: "¿Cuántos psi a 31 gpm?", explanation: "K 4.9 da 7 psi." }] }).join("\n")).toMatch(/q1 numbers/);
    expect(compareYaml(enQ, { questions: [{ id: "q2", prompt: "x", explanation: "y" }] }).join("\n")).toMatch(/ids\/order differ/);
  });
});

describe("the en: stamp", () => {
  it("is the first 16 hex of the SHA-256 of the English bytes (checked against node's own digest of a known string)", () => {
    // sha256("abc") = ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad (FIPS 180-2, appendix B.1)
    expect(enHash("abc")).toBe("ba7816bf8f01cfea");
  });
  it("is written without touching the rest of the file, and replaced in place", () => {
    const mdx = "---\ntitle: Hola\nsummary: >-\n  Un resumen largo\n---\n\nCuerpo  con  espacios\n";
    const once = writeStamp(mdx, "0123456789abcdef", "mdx");
    expect(once).toBe("---\ntitle: Hola\nsummary: >-\n  Un resumen largo\nen: 0123456789abcdef\n---\n\nCuerpo  con  espacios\n");
    expect(writeStamp(once, "fedcba9876543210", "mdx")).toBe(once.replace("0123456789abcdef", "fedcba9876543210"));
    const yaml = "# comentario\nquestions:\n  - id: a   # sin cambio\n";
    expect(writeStamp(yaml, "0123456789abcdef", "yaml")).toBe("# comentario\nen: 0123456789abcdef\nquestions:\n  - id: a   # sin cambio\n");
    expect(readStamp(writeStamp(yaml, "0123456789abcdef", "yaml"), "yaml")).toBe("0123456789abcdef");
  });
});

describe("the loader and the twin check on a throwaway tree", () => {
  const dirs: string[] = [];
  afterAll(() => dirs.forEach((d) => rmSync(path.dirname(d), { recursive: true, force: true })));
  const tree = () => {
    const d = makeTwinTree();
    dirs.push(d);
    return d;
  };
  const lesson = "modules/freeze-protection/antifreeze-limits.mdx";

  it("accepts a tree whose every file has a matching, stamped twin, and merges the Spanish text by id", () => {
    const d = tree();
    expect(problemsOf(d)).toEqual([]);
    const catalog = loadCatalogFrom(d);
    expect(Object.keys(catalog.es.lessons).length).toBe(catalog.modules.reduce((n, m) => n + m.lessons.length, 0));
    expect(twinPairs(catalog).length).toBeGreaterThan(100);
  });

  it("names a missing twin and an extra Spanish file", () => {
    const d = tree();
    unlinkSync(path.join(d, "es", lesson));
    writeFileSync(path.join(d, "es/reference/no-such-card.mdx"), "---\ntitle: x\n---\n");
    const found = problemsOf(d).join("\n");
    expect(found).toMatch(/content\/es\/modules\/freeze-protection\/antifreeze-limits\.mdx: missing Spanish twin/);
    expect(found).toMatch(/content\/es\/reference\/no-such-card\.mdx: extra Spanish file/);
  });

  it("refuses grading fields in a Spanish question, a changed question order and changed option ids", () => {
    const d = tree();
    const file = path.join(d, "es/modules/freeze-protection/quiz.yaml");
    const bank = YAML.parse(readFileSync(file, "utf8"));
    bank.questions[0].correct = "a";
    bank.questions[0].options = bank.questions[0].options?.map((o: { id: string; text: string }, i: number) => ({ ...o, id: i === 0 ? "z" : o.id }));
    writeFileSync(file, YAML.stringify(bank));
    const found = problemsOf(d).join("\n");
    expect(found).toMatch(/es\/modules\/freeze-protection\/quiz\.yaml: field "questions\.0": must not be in the Spanish file \(correct\)/);
    [bank.questions[0], bank.questions[1]] = [bank.questions[1], bank.questions[0]];
    delete bank.questions[1].correct;
    writeFileSync(file, YAML.stringify(bank));
    expect(problemsOf(d).join("\n")).toMatch(/quiz\.yaml: field "questions": ids\/order differ from the English/);
  });

  it("fails when the English changed after the Spanish was stamped, and passes once restamped", () => {
    const d = tree();
    const en = path.join(d, lesson);
    writeFileSync(en, readFileSync(en, "utf8").replace("## ", "## Antifreeze: "));
    expect(problemsOf(d).join("\n")).toMatch(/antifreeze-limits\.mdx: field "en": the English changed since the Spanish was written: update content\/es\/modules\/freeze-protection\/antifreeze-limits\.mdx[^\n]*npm run content:stamp -- content\/es\//);
    const es = path.join(d, "es", lesson);
    writeFileSync(es, writeStamp(readFileSync(es, "utf8"), enHash(readFileSync(en)), "mdx").replace("## ", "## Anticongelante: "));
    expect(problemsOf(d)).toEqual([]);
  });
});
