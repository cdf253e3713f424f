// Content accuracy lint: cautions name who governs, questions test what their lesson teaches, options
// give nothing away by length or position, figures carry their source, and parametric draws stay
// inside the NFPA 13D code floors. Run: npx vitest run tests/unit/content-lint.test.ts
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { loadCatalogFrom } from "@/lib/content/load";
import type { Question } from "@/lib/content/schema";
import { drawParams, parametricAnswer, prng } from "@/lib/quiz/engine";
import { countMarkers, figuresIn, keyedNumbers, proseBlocks } from "@/scripts/lib/content-figures";

const root = path.resolve("content");
const catalog = loadCatalogFrom(root);
const lessons = catalog.modules.flatMap((m) => m.lessons);
const docs = [
  ...lessons.map((l) => ({ name: `${l.module}/${l.slug}`, body: l.body, sources: l.meta.sources })),
  ...catalog.cards.map((c) => ({ name: `card ${c.slug}`, body: c.body, sources: c.meta.sources })),
];

/**
 * NFPA 13D code floors a parametric question must never key below.
 * NFPA 13D (2022), sprinkler discharge provisions: 7 psi minimum operating pressure at any sprinkler,
 * 0.05 gpm/ft² minimum design density. NFPA 13D (2022) 6.1.2–6.1.3: 10 minutes, or 7 minutes for
 * stored water at dwellings that meet the 7-minute conditions (public reproduction of 6.1.3).
 */
const MIN_OPERATING_PSI = 7;
const MIN_DURATION_MIN = 7;

const GOVERNANCE = [/listing/i, /adopted (code|edition|fire code|plumbing)/i, /amendment/i, /AHJ|authority having jurisdiction/i];

describe("cautions", () => {
  it("every caution in a lesson or card says that the listing, the adopted code with its local amendments and the AHJ govern", () => {
    const missing: string[] = [];
    let count = 0;
    for (const d of docs) {
      for (const [, body] of d.body.matchAll(/<Callout\s+type="caution"[^>]*>([\s\S]*?)<\/Callout>/g)) {
        count++;
        if (!GOVERNANCE.every((re) => re.test(body!))) missing.push(d.name);
      }
    }
    expect(count).toBeGreaterThanOrEqual(60);
    expect(missing).toEqual([]);
  });

  it("the three lessons the review named carry a caution with the governance note", () => {
    for (const slug of ["protecting-sprinklers-during-finishes", "rough-in-and-trim-sequence", "what-not-to-promise"]) {
      const l = lessons.find((x) => x.slug === slug)!;
      expect(l.body, slug).toMatch(/<Callout\s+type="caution"[\s\S]*?authority having jurisdiction[\s\S]*?<\/Callout>/);
    }
  });
});

describe("questions agree with their lessons", () => {
  const items = catalog.modules.flatMap((m) => m.questions.map((q) => ({ m, q })));

  it("points every question at a lesson of its own module", () => {
    const bad = items.filter(({ m, q }) => !m.lessons.some((l) => l.slug === q.lesson)).map(({ q }) => q.id);
    expect(bad).toEqual([]);
  });

  it("teaches every keyed figure in the question's lesson, outside any 'from memory' paragraph", () => {
    const bad: string[] = [];
    for (const { m, q } of items) {
      const lesson = m.lessons.find((l) => l.slug === q.lesson);
      if (!lesson) continue;
      const blocks = proseBlocks(lesson.body).map((b) => b.text.replace(/,(?=\d{3})/g, ""));
      for (const n of keyedNumbers(q as Parameters<typeof keyedNumbers>[0])) {
        const re = new RegExp(`(?<![\\d.])${n.replace(".", "\\.")}(?![\\d])`);
        const teaching = blocks.filter((b) => re.test(b));
        if (teaching.length === 0) bad.push(`${q.id}: ${n} not in lesson ${q.lesson}`);
        else if (teaching.every((b) => /from memory/i.test(b))) bad.push(`${q.id}: ${n} only in 'from memory' text of ${q.lesson}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it("never marks a keyed figure 'from memory' in the explanation", () => {
    const bad = items
      .filter(({ q }) => keyedNumbers(q as Parameters<typeof keyedNumbers>[0]).length > 0 && /from memory/i.test(q.explanation))
      .map(({ q }) => q.id);
    expect(bad).toEqual([]);
  });

  it("keys hsw-water-path-order in the order the lesson's diagram draws (meter, main shutoff/control valve, backflow preventer)", () => {
    const q = items.find(({ q }) => q.id === "hsw-water-path-order")!.q as Extract<Question, { type: "single" }>;
    const key = q.options.find((o) => o.id === q.correct)!.text;
    expect(key.indexOf("meter")).toBeLessThan(key.indexOf("control valve"));
    expect(key.indexOf("control valve")).toBeLessThan(key.indexOf("backflow"));
    const diagram = lessons.find((l) => l.slug === "from-water-service-to-sprinkler")!.body;
    expect(diagram.indexOf(">Water meter<")).toBeLessThan(diagram.indexOf(">Main shutoff / control valve<"));
    expect(diagram.indexOf(">Main shutoff / control valve<")).toBeLessThan(diagram.indexOf(">Backflow preventer<"));
  });
});

describe("item writing", () => {
  const singles = (qs: Question[]) => qs.filter((q): q is Extract<Question, { type: "single" }> => q.type === "single");

  it.each(catalog.modules.map((m) => [m.slug, m] as const))("%s: the key is the longest option in at most 40% of single-choice questions", (_, m) => {
    const qs = singles(m.questions);
    const longest = qs.filter((q) => {
      const key = q.options.find((o) => o.id === q.correct)!.text.length;
      return q.options.every((o) => o.id === q.correct || o.text.length < key);
    });
    expect(qs.length).toBeGreaterThan(0);
    expect(longest.length / qs.length, longest.map((q) => q.id).join(", ")).toBeLessThanOrEqual(0.4);
  });

  it.each(catalog.modules.map((m) => [m.slug, m] as const))("%s: keys are spread over positions (never all in one, at most half in one)", (_, m) => {
    const positions = singles(m.questions).map((q) => q.options.findIndex((o) => o.id === q.correct));
    const counts = new Map<number, number>();
    for (const p of positions) counts.set(p, (counts.get(p) ?? 0) + 1);
    expect(counts.size).toBeGreaterThan(1);
    expect(Math.max(...counts.values()) / positions.length).toBeLessThanOrEqual(0.5);
  });
});

describe("figures and their sources", () => {
  it("finds no figure with a unit that is unsourced in any lesson or card", () => {
    const bad = docs.flatMap((d) => figuresIn(d.body, d.sources).filter((f) => f.sourcing === "unsourced").map((f) => `${d.name}: ${f.text} — ${f.context}`));
    expect(bad).toEqual([]);
  });

  it("keeps at most 66 'from memory' markers across lessons, cards, quiz banks and the glossary", () => {
    let markers = countMarkers(readFileSync(path.join(root, "glossary.yaml"), "utf8"));
    for (const m of catalog.modules) {
      markers += countMarkers(readFileSync(path.join(root, "modules", m.slug, "quiz.yaml"), "utf8"));
      for (const l of m.lessons) markers += countMarkers(readFileSync(path.join(root, "modules", m.slug, `${l.slug}.mdx`), "utf8"));
    }
    for (const c of catalog.cards) markers += countMarkers(readFileSync(path.join(root, "reference", `${c.slug}.mdx`), "utf8"));
    expect(markers).toBeLessThanOrEqual(66);
  });

  it("the classifier tells a cited figure from an unsourced one (so the lint above can fail)", () => {
    expect(figuresIn("Pressure must be at least 7 psi.", [])[0]!.sourcing).toBe("unsourced");
    expect(figuresIn("At least 7 psi (NFPA 13D (2022), sprinkler discharge provisions).", [])[0]!.sourcing).toBe("provision");
    expect(figuresIn("About 18 in (from memory — verify).", [])[0]!.sourcing).toBe("from memory");
    expect(figuresIn("Space them 6 ft apart (common practice).", [])[0]!.sourcing).toBe("common practice");
  });
});

describe("paths and modules agree", () => {
  it("every module in a path lists that path, and the path's audience is one the module serves", () => {
    const bad: string[] = [];
    for (const p of catalog.paths) {
      for (const slug of p.modules) {
        const m = catalog.modules.find((x) => x.slug === slug)!;
        if (!m.meta.paths.includes(p.slug)) bad.push(`${p.slug}: module ${slug} does not list the path`);
        for (const a of p.audience) if (!m.meta.audience.includes(a as never)) bad.push(`${p.slug}: module ${slug} does not serve ${a}`);
      }
    }
    for (const m of catalog.modules) for (const ps of m.meta.paths) {
      if (!catalog.paths.find((p) => p.slug === ps)?.modules.includes(m.slug)) bad.push(`${m.slug}: lists ${ps}, which does not include it`);
    }
    expect(bad).toEqual([]);
  });
});

describe("parametric questions stay inside NFPA 13D floors", () => {
  const parametric = catalog.modules
    .flatMap((m) => m.questions)
    .filter((q): q is Extract<Question, { type: "parametric" }> => q.type === "parametric");

  it("samples every parametric question 2,000 times and never keys a pressure below 7 psi or a test curve stretched past its flow", () => {
    expect(parametric.length).toBeGreaterThanOrEqual(10);
    const bad = new Set<string>();
    for (const q of parametric) {
      const rand = prng(13_2022 + q.id.length);
      for (let i = 0; i < 2000; i++) {
        const params = drawParams(q, rand);
        const all = { ...q.fixed, ...params };
        const answer = parametricAnswer(q, params);
        if (q.formula === "sprinklerPressurePsi" && answer < MIN_OPERATING_PSI) bad.add(`${q.id}: keys ${answer.toFixed(2)} psi for ${JSON.stringify(all)}`);
        if (q.formula === "sprinklerFlowGpm" && all.pressurePsi! < MIN_OPERATING_PSI) bad.add(`${q.id}: draws ${all.pressurePsi} psi`);
        if (q.formula === "flowTestAvailablePsi" && all.demandFlowGpm! > all.testFlowGpm!) bad.add(`${q.id}: demand ${all.demandFlowGpm} past the tested ${all.testFlowGpm} gpm`);
        if (q.formula === "storedWaterGal" && all.durationMin! < MIN_DURATION_MIN) bad.add(`${q.id}: duration ${all.durationMin} min`);
      }
    }
    expect([...bad]).toEqual([]);
  });

  it("also holds at the corners of every range (the draw could miss them)", () => {
    const bad: string[] = [];
    for (const q of parametric.filter((x) => x.formula === "sprinklerPressurePsi")) {
      const k = q.params.kFactor ? q.params.kFactor.max : q.fixed.kFactor!;
      const flow = q.params.flowGpm ? q.params.flowGpm.min : q.fixed.flowGpm!;
      const p = parametricAnswer(q, { kFactor: k, flowGpm: flow });
      if (p < MIN_OPERATING_PSI) bad.push(`${q.id}: K ${k}, ${flow} gpm → ${p.toFixed(2)} psi`);
    }
    for (const q of parametric.filter((x) => x.formula === "flowTestAvailablePsi")) {
      if (q.params.demandFlowGpm!.max > q.params.testFlowGpm!.min) bad.push(`${q.id}: demand range reaches past the tested flow`);
    }
    expect(bad).toEqual([]);
  });

  it("keys sc-pressure-for-listed-flow at or above 7 psi even for its largest K and smallest flow (the old range keyed 6.25 psi)", () => {
    const q = parametric.find((x) => x.id === "sc-pressure-for-listed-flow")!;
    expect(parametricAnswer(q, { kFactor: q.params.kFactor!.max, flowGpm: q.params.flowGpm!.min })).toBeGreaterThanOrEqual(MIN_OPERATING_PSI);
    // the range it replaced: K 5.6 at 14 gpm keys (14 ÷ 5.6)² = 6.25 psi, below the floor
    expect((14 / 5.6) ** 2).toBeLessThan(MIN_OPERATING_PSI);
  });
});

describe("facts the review corrected stay corrected", () => {
  const text = (slug: string) => (lessons.find((l) => l.slug === slug) ?? catalog.cards.find((c) => c.slug === slug))!.body;

  it("teaches the 5 gpm household allowance by code path", () => {
    for (const slug of ["stand-alone-and-multipurpose", "elevation-meter-and-backflow-losses", "meter-and-tap-sizing"]) {
      expect(text(slug), slug).toMatch(/more than one dwelling unit/);
      expect(text(slug), slug).toMatch(/P2904/);
    }
    expect(text("shop-drawings-and-calc-sheet")).toMatch(/code path/);
  });

  it("uses the CPVC published average bore and states the 13D floors on the design-discharge card", () => {
    expect(text("choosing-pipe-materials")).toMatch(/1\.101 in/);
    const card = text("design-discharge-and-pressure");
    expect(card).toMatch(/7 psi/);
    expect(card).toMatch(/0\.05 gpm per square foot/);
  });

  it("describes the concealed sprinkler sequence plate first, then element, then deflector", () => {
    const card = text("concealed-sprinklers-and-cover-plates");
    expect(card.indexOf("plate drops away")).toBeGreaterThan(-1);
    expect(card.indexOf("plate drops away")).toBeLessThan(card.indexOf("element"));
    expect(card.indexOf("element")).toBeLessThan(card.indexOf("deflector drops"));
    const g = catalog.glossary.find((t) => t.id === "concealed-sprinkler")!.definition;
    expect(g.indexOf("plate drops away")).toBeLessThan(g.indexOf("deflector drops"));
  });

  it("takes residential pipe support from the plumbing code, not the commercial hanger table", () => {
    const l = text("chemical-compatibility-and-support");
    expect(l).toMatch(/P2605\.1/);
    expect(l).toMatch(/CPVC, 1 in and smaller \| 3 ft/);
    expect(l).toMatch(/PEX, 1 in and smaller \| 32 in/);
  });

  it("ties the waterflow alarm to NFPA 72 smoke alarms", () => {
    for (const slug of ["from-water-service-to-sprinkler", "when-a-sprinkler-operates", "yearly-alarm-test"]) expect(text(slug), slug).toMatch(/NFPA 72/);
  });

  it("keeps the other corrections: hydrostatic test, spares, extended coverage, multipurpose listing, omissions, antifreeze, lots, editions", () => {
    expect(text("acceptance-testing")).toMatch(/no\s+edition of NFPA 13D asks for it/);
    expect(text("spare-sprinklers")).toMatch(/not from NFPA 13D/);
    expect(text("sprinkler-types")).toMatch(/does not make it an <Term id="extended-coverage">extended-coverage<\/Term> sprinkler/);
    for (const d of docs) expect(d.body, d.name).not.toMatch(/listed for multipurpose use|multipurpose listing(?! to look for|")/);
    const omitted = text("where-sprinklers-may-be-omitted");
    expect(omitted).toMatch(/with or without storage/);
    expect(omitted).toMatch(/above the equipment/);
    expect(omitted).toMatch(/55 ft²/);
    expect(omitted).toMatch(/24 ft²/);
    const af = text("antifreeze-limits");
    for (const fact of ["September 30, 2022", "48% glycerine", "38% propylene glycol", "30% propylene glycol"]) expect(af).toContain(fact);
    expect(text("stand-alone-and-multipurpose")).not.toMatch(/Lot 40/);
    expect(text("water-supplies-and-duration")).toMatch(/Lot 40 \(tank and pump\)/);
    for (const d of [...lessons.map((l) => l.meta.edition), ...catalog.cards.map((c) => c.meta.edition)]) {
      expect(d).toMatch(/2025/);
      expect(d).toMatch(/2024/);
    }
    const warm = catalog.modules.flatMap((m) => m.questions).find((q) => q.id === "fp-warm-side")!;
    expect(warm.prompt).toMatch(/between the ceiling joists/);
  });
});

describe("question banks are deep enough and fit their audience", () => {
  it.each(catalog.modules.map((m) => [m.slug, m] as const))("%s: the bank holds at least twice the questions drawn per attempt", (_, m) => {
    expect(m.questions.length).toBeGreaterThanOrEqual(2 * m.meta.quiz.questionsPerAttempt);
  });

  // modules whose lessons teach arithmetic a learner does on the job (flow, pressure, friction, coverage, supply)
  const CALCULATION_MODULES = ["hydraulics-and-permits", "fire-and-water-officials", "sprinklers-and-coverage", "freeze-protection", "layouts-and-special-spaces"];
  it.each(CALCULATION_MODULES)("%s: at least three numeric or parametric questions", (slug) => {
    const m = catalog.modules.find((x) => x.slug === slug)!;
    expect(m.questions.filter((q) => q.type === "numeric" || q.type === "parametric").length).toBeGreaterThanOrEqual(3);
  });

  it("never quizzes the builder-sales path on cure charts, solvent cement or test pressures", () => {
    const sales = catalog.paths.find((p) => p.slug === "builder-sales")!;
    const bad: string[] = [];
    for (const slug of sales.modules) {
      const m = catalog.modules.find((x) => x.slug === slug)!;
      for (const q of m.questions) {
        const text = [q.prompt, ...("options" in q ? q.options.map((o) => o.text) : [])].join(" ");
        if (/\bcur(e|ed|es|ing)\b|solvent|cement|hydrostatic|test pressure/i.test(text)) bad.push(`${slug}/${q.id}`);
      }
    }
    expect(sales.modules).not.toContain("inspection-testing-maintenance");
    expect(bad).toEqual([]);
  });
});

describe("the depth lessons teach what their skills and questions ask", () => {
  const body = (slug: string) => lessons.find((l) => l.slug === slug)!.body;

  it("teaches the service-connection flow test the hp-residential-flow-test skill signs off, with the losses already inside the readings", () => {
    const hp = catalog.modules.find((m) => m.slug === "hydraulics-and-permits")!;
    const skill = hp.skills.find((s) => s.id === "hp-residential-flow-test")!;
    const l = body("supplies-beyond-the-main");
    expect(l).toContain(skill.title);
    expect(l).toMatch(/after the meter/);
    expect(l).toMatch(/Do not subtract those losses again/);
    // the worked test stays inside its tested flow (NFPA 291: a curve stretched past its tested flow is a guess)
    expect(l).toMatch(/testFlowGpm: 30, demandFlowGpm: 26/);
  });

  it("cites the residential code's pressure, expansion and hammer provisions, and starts the calculation from the PRV setting", () => {
    const l = body("pressure-problems");
    for (const p of ["P2903.3.1", "P2903.4", "P2903.5"]) expect(l).toContain(p);
    expect(l).toMatch(/80 psi/);
    expect(l).toMatch(/70 − 8 = \*\*62 psi\*\*/);
  });

  it("puts the P2904.7 sign and owner's manual in the shut-off, close-out and sales lessons", () => {
    for (const slug of ["leak-detection-and-shutoff-valves", "records-and-close-out", "add-ons-shared-walls-and-older-homes", "irc-prescriptive-path"]) {
      expect(body(slug), slug).toMatch(/P2904\.7/);
    }
  });

  it("teaches P2904's Equation 29-1 with every term, and the loop split that balances both legs", () => {
    const p = body("irc-prescriptive-path");
    expect(p).toMatch(/Pt = Psup − PLsvc − PLm − PLd − PLe − Psp/);
    expect(p).toMatch(/60 − 3\.5 − 6 − 0 − 8\.7 − 10 = \*\*31\.8 psi\*\*/);
    const loop = body("looped-and-networked-layouts");
    // Hazen-Williams: equal loss on both legs of one size means Q1/Q2 = (L2/L1)^(1/1.85)
    const ratio = (90 / 60) ** (1 / 1.85);
    expect(ratio).toBeCloseTo(1.245, 3);
    expect(26 / (1 + ratio)).toBeCloseTo(11.6, 1);
    expect(loop).toMatch(/\*\*11\.6 gpm\*\*/);
    expect(loop).toMatch(/\*\*14\.4 gpm\*\*/);
  });

  it("keeps the heat-source distance table marked 'from memory' and keys no question on it", () => {
    const l = body("heat-sources-and-temperature-ratings");
    const lead = l.slice(l.indexOf("## The heat-source table"), l.indexOf("| Heat source"));
    expect(lead).toMatch(/from memory — verify/);
    const m = catalog.modules.find((x) => x.slug === "sprinklers-and-coverage")!;
    for (const q of m.questions.filter((x) => x.lesson === "heat-sources-and-temperature-ratings")) {
      const keyed = keyedNumbers(q as Parameters<typeof keyedNumbers>[0]);
      for (const n of ["36", "60", "42", "18", "9", "24", "6", "3"]) expect(keyed, q.id).not.toContain(n);
    }
  });

  it("slides the Lot 11 pendent and shows the wall distance it breaks (obstruction fixes re-check every distance)", () => {
    const l = body("obstructions-in-detail");
    expect(14 / 2 + 3.5).toBe(10.5);
    expect(l).toMatch(/10\.5 ft is more than 8 ft/);
  });
});
