// Edition-aware content: which passages and questions apply to an adopted NFPA 13D edition, the
// content checks on <Edition> tags and "what changed" lines, and the rendered passages.
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { afterAll, describe, expect, it } from "vitest";
import { editionComponents } from "@/components/lesson/edition";
import { EDITIONS, editionLabel, editionTags, editionsOf, questionApplies } from "@/lib/content/editions";
import { ContentError, loadCatalogFrom } from "@/lib/content/load";
import { drawAttempt, editionBank } from "@/lib/quiz/engine";

const root = path.resolve("content");
const catalog = loadCatalogFrom(root);

describe("editionsOf", () => {
  it("reads only, from and to (inclusive) against the five editions", () => {
    expect(EDITIONS).toEqual([2013, 2016, 2019, 2022, 2025]);
    expect(editionsOf({ only: "2013 2016" })).toEqual({ editions: [2013, 2016] });
    expect(editionsOf({ only: "2025,2013" })).toEqual({ editions: [2013, 2025] });
    expect(editionsOf({ from: "2019" })).toEqual({ editions: [2019, 2022, 2025] });
    expect(editionsOf({ to: 2016 })).toEqual({ editions: [2013, 2016] });
    expect(editionsOf({ from: "2016", to: "2022" })).toEqual({ editions: [2016, 2019, 2022] });
  });
  it("names the problem for unknown years, mixed forms, reversed ranges and nothing at all", () => {
    expect(editionsOf({ only: "2018" })).toHaveProperty("problem");
    expect(editionsOf({ only: "2016", from: "2019" })).toHaveProperty("problem");
    expect(editionsOf({ from: "2022", to: "2016" })).toHaveProperty("problem");
    expect(editionsOf({ from: "2020" })).toHaveProperty("problem");
    expect(editionsOf({})).toHaveProperty("problem");
  });
  it("labels runs and lists for the reader", () => {
    expect(editionLabel([2013, 2016, 2019])).toBe("2013 to 2019");
    expect(editionLabel([2013, 2025])).toBe("2013 and 2025");
    expect(editionLabel([2022])).toBe("2022");
  });
  it("finds the tags in an MDX body", () => {
    expect(editionTags('a <Edition only="2013 2016">x</Edition> b <Edition from={2022}>y</Edition>').map((t) => t.spec)).toEqual([{ only: "2013 2016" }, { from: "2022" }]);
  });
});

describe("where the content marks edition differences", () => {
  // The five places the accuracy review found edition differences, each with the passage that says
  // which editions its statement was checked against (in English and in its Spanish twin).
  const places = {
    "omitted spaces": "modules/layouts-and-special-spaces/spaces-without-sprinklers.mdx",
    antifreeze: "modules/freeze-protection/antifreeze-limits.mdx",
    alarms: "modules/how-systems-work/from-water-service-to-sprinkler.mdx",
    "the 5 gpm allowance": "modules/how-systems-work/stand-alone-and-multipurpose.mdx",
    "support spacing": "modules/pipe-and-joining/chemical-compatibility-and-support.mdx",
  };
  for (const [topic, file] of Object.entries(places)) {
    it(`${topic}: the same edition passages in ${file} and its Spanish twin`, () => {
      const en = editionTags(readFileSync(path.join(root, file), "utf8")).map((t) => t.spec);
      const es = editionTags(readFileSync(path.join(root, "es", file), "utf8")).map((t) => t.spec);
      expect(en.length).toBeGreaterThan(0);
      expect(es).toEqual(en);
      for (const spec of en) expect(editionsOf(spec)).toHaveProperty("editions");
    });
  }
});

describe("questions for an edition", () => {
  const fp = catalog.modules.find((m) => m.slug === "freeze-protection")!;
  const limited = fp.questions.filter((q) => q.editions);

  it("the content marks edition-limited antifreeze questions", () => {
    expect(limited.map((q) => [q.id, q.editions])).toEqual([
      ["fp-existing-loop-interim-limits", [2016, 2019]],
      ["fp-legacy-solution-after-sunset", [2022, 2025]],
    ]);
  });

  it("keeps questions without editions for every edition, edition-limited ones only for theirs, and none of those without an edition", () => {
    expect(questionApplies({}, null)).toBe(true);
    expect(questionApplies({ editions: [2016, 2019] }, 2019)).toBe(true);
    expect(questionApplies({ editions: [2016, 2019] }, 2022)).toBe(false);
    expect(questionApplies({ editions: [2016, 2019] }, null)).toBe(false);
    const ids = (e: number | null) => editionBank(fp.questions, e).map((q) => q.id);
    expect(ids(2016)).toContain("fp-existing-loop-interim-limits");
    expect(ids(2016)).not.toContain("fp-legacy-solution-after-sunset");
    expect(ids(2022)).toContain("fp-legacy-solution-after-sunset");
    expect(ids(2013)).not.toContain("fp-existing-loop-interim-limits");
    expect(ids(null)).toHaveLength(fp.questions.length - 2);
  });

  it("draws deterministically and never outside the edition's bank", () => {
    for (const edition of [null, ...EDITIONS]) {
      const bank = editionBank(fp.questions, edition);
      const allowed = new Set(bank.map((q) => q.id));
      for (let seed = 1; seed <= 200; seed++) {
        const drawn = drawAttempt(bank, fp.meta.quiz.questionsPerAttempt, seed);
        expect(drawn.every((d) => allowed.has(d.question.id))).toBe(true);
        if (seed <= 3) expect(drawAttempt(bank, fp.meta.quiz.questionsPerAttempt, seed)).toEqual(drawn);
      }
    }
  });
});

describe("content checks", () => {
  const dirs: string[] = [];
  afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));
  const copy = () => {
    const dir = mkdtempSync(path.join(tmpdir(), "riser-editions-"));
    dirs.push(dir);
    cpSync(root, dir, { recursive: true });
    return dir;
  };
  const problems = (dir: string) => {
    try {
      loadCatalogFrom(dir);
      return [];
    } catch (err) {
      return (err as ContentError).problems;
    }
  };

  it("refuses an unknown edition in a passage and in a question, and a change line without a raised revision", () => {
    const dir = copy();
    const lesson = path.join(dir, "modules/freeze-protection/antifreeze-limits.mdx");
    writeFileSync(lesson, readFileSync(lesson, "utf8").replace('<Edition from="2022">', '<Edition from="2021">').replace("updated:", 'changed: "Antifreeze limits now per edition"\nupdated:'));
    const quiz = path.join(dir, "modules/freeze-protection/quiz.yaml");
    writeFileSync(quiz, readFileSync(quiz, "utf8").replace("editions: [2016, 2019]", "editions: [2016, 2018]"));
    const found = problems(dir).join("\n");
    expect(found).toMatch(/antifreeze-limits\.mdx: <Edition from="2021">: unknown edition/);
    expect(found).toMatch(/antifreeze-limits\.mdx: field "changed": raise "revision"/);
    expect(found).toMatch(/quiz\.yaml: field "questions\.\d+\.editions\.1": must be one of 2013, 2016, 2019, 2022, 2025/);
  });

  it("accepts a material change with its revision raised", () => {
    const dir = copy();
    const lesson = path.join(dir, "modules/freeze-protection/antifreeze-limits.mdx");
    writeFileSync(lesson, readFileSync(lesson, "utf8").replace("updated:", 'revision: 2\nchanged: "Antifreeze limits now shown per edition"\nupdated:'));
    expect(problems(dir)).toEqual([]);
    const l = loadCatalogFrom(dir).modules.find((m) => m.slug === "freeze-protection")!.lessons.find((x) => x.slug === "antifreeze-limits")!;
    expect([l.meta.revision, l.meta.changed]).toEqual([2, "Antifreeze limits now shown per edition"]);
  });
});

describe("rendered passages", () => {
  const page = (current: number | null) => {
    const { Edition, Editions } = editionComponents(current);
    return renderToStaticMarkup(
      createElement(Editions, null, createElement(Edition, { from: "2022" }, "NEW RULE"), createElement(Edition, { from: "2013", to: "2019" }, "OLD RULE")),
    );
  };
  it("puts the adopted edition's passage first and open, the others one click away and labelled", () => {
    const html = page(2016);
    expect(html.indexOf("OLD RULE")).toBeLessThan(html.indexOf("NEW RULE"));
    expect(html).toMatch(/<section[^>]*data-current="true"[^>]*>.*2013 to 2019: your adopted edition.*OLD RULE/);
    expect(html).toMatch(/<details[^>]*data-current="false"[^>]*><summary[^>]*>Other edition: NFPA 13D 2022 and 2025<\/summary>.*NEW RULE/);
  });
  it("shows every passage, labelled, when the organization has no default edition", () => {
    const html = page(null);
    expect(html).not.toContain("<details");
    expect(html).toContain("NFPA 13D 2022 and 2025");
    expect(html).toContain("NFPA 13D 2013 to 2019");
  });
});
